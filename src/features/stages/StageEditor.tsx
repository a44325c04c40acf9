// Settings of the selected stage: name, medium (from the library or own), medium temperature,
// h (constant or by surface temperature), radiation, end condition and method.
// Every edit is checked with the plan's stageSchema before it is committed.
import { stageSchema, type Material, type MethodChoice, type PointId, type Stage } from '@/schema/planSchema';
import type { MaterialEntry, MediumEntry } from '@/library/libraryEntrySchema';
import { mediumFromLibrary } from '@/library/libraryToPlan';
import type { UnitSystem } from '@/features/units/unitSystem';
import { FractionField } from '@/features/part/FractionField';
import { QuantityField } from '@/features/part/QuantityField';
import { TextField } from '@/features/part/TextField';
import { validateEdit } from '@/features/part/validateEdit';
import { HeatTransferEditor } from './HeatTransferEditor';
import { EndConditionEditor } from './EndConditionEditor';
import { METHOD_LABELS } from './methodLabels';

const OWN_MEDIUM = '';
/** Emissivity offered when radiation is switched on and nothing better is known (common practice for scaled steel). */
const DEFAULT_EMISSIVITY = 0.8;


export interface StageEditorProps {
  stage: Stage;
  index: number;
  material: Material;
  points: { id: PointId; label: string }[];
  oneD: boolean;
  media: readonly MediumEntry[];
  materials: readonly MaterialEntry[];
  system: UnitSystem;
  onChange: (stage: Stage, mergeKey?: string) => void;
}

export function StageEditor({ stage, index, material, points, oneD, media, materials, system, onChange }: StageEditorProps) {
  /** Check a candidate stage and commit it; the returned message (if any) is shown by the field. */
  const commit = (candidate: Stage, fieldLabel: string, mergeKey?: string): string | null => {
    const checked = validateEdit(stageSchema, candidate, fieldLabel);
    if (!checked.ok) return checked.message;
    onChange(checked.value, mergeKey === undefined ? undefined : `stage${index}.${mergeKey}`);
    return null;
  };
  const { medium } = stage;
  const libraryMedium = media.find((m) => m.id === medium.libraryId);
  const pickMedium = (entry: MediumEntry) => {
    const converted = mediumFromLibrary(entry, {
      material: materials.find((m) => m.id === material.libraryId),
      emissivity: material.surfaceEmissivity,
      heatTransfer: medium.heatTransfer.kind === 'surface-table' && entry.boilingCurve ? 'boiling-curve' : 'constant',
    });
    return converted.ok ? commit({ ...stage, medium: converted.medium }, 'Medium') : converted.message;
  };

  return (
    <section className="panel" aria-labelledby="stage-editor-heading">
      <h2 id="stage-editor-heading">
        Stage {index + 1} settings
      </h2>
      <TextField label="Stage name" value={stage.name} onCommit={(name) => commit({ ...stage, name }, 'Stage name', 'name')} />
      <fieldset className="group">
        <legend>Medium</legend>
        <div className="field">
          <label htmlFor="medium-pick">From the library</label>
          <select
            id="medium-pick"
            value={libraryMedium ? libraryMedium.id : OWN_MEDIUM}
            onChange={(e) => {
              const entry = media.find((m) => m.id === e.target.value);
              if (entry) pickMedium(entry);
            }}
          >
            {!libraryMedium && <option value={OWN_MEDIUM}>this stage's own medium</option>}
            {media.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name}
              </option>
            ))}
          </select>
        </div>
        {libraryMedium && <p className="source-line">{libraryMedium.description}</p>}
        <TextField label="Medium name" value={medium.name} onCommit={(name) => commit({ ...stage, medium: { ...medium, name } }, 'Medium name', 'medium.name')} />
        <QuantityField
          label="Medium temperature"
          kind="temperature"
          valueSI={medium.temperature}
          system={system}
          onCommit={(t) => commit({ ...stage, medium: { ...medium, temperature: t } }, 'Medium temperature', 'medium.temperature')}
        />
        <HeatTransferEditor
          heatTransfer={medium.heatTransfer}
          boilingCurve={libraryMedium?.boilingCurve}
          system={system}
          onChange={(heatTransfer, fieldLabel, mergeKey) => commit({ ...stage, medium: { ...medium, heatTransfer } }, fieldLabel, mergeKey)}
        />
        <div className="field field-check">
          <input
            id="radiation-on"
            type="checkbox"
            checked={medium.radiation !== undefined}
            onChange={(e) => {
              const { radiation: _dropped, ...withoutRadiation } = medium;
              commit(
                { ...stage, medium: e.target.checked ? { ...medium, radiation: { emissivity: material.surfaceEmissivity ?? DEFAULT_EMISSIVITY } } : withoutRadiation },
                'Radiation',
              );
            }}
          />
          <label htmlFor="radiation-on">Surface radiation to the surroundings</label>
        </div>
        {medium.radiation && (
          <FractionField
            label="Surface emissivity (0 to 1)"
            value={medium.radiation.emissivity}
            onCommit={(emissivity) => commit({ ...stage, medium: { ...medium, radiation: { ...medium.radiation, emissivity } } }, 'Surface emissivity', 'medium.emissivity')}
          />
        )}
      </fieldset>
      <EndConditionEditor end={stage.end} points={points} oneD={oneD} system={system} onChange={(end, fieldLabel, mergeKey) => commit({ ...stage, end }, fieldLabel, mergeKey)} />
      <div className="field">
        <label htmlFor="method-pick">Method</label>
        <select id="method-pick" value={stage.method} onChange={(e) => commit({ ...stage, method: e.target.value as MethodChoice }, 'Method')}>
          {(Object.keys(METHOD_LABELS) as MethodChoice[]).map((m) => (
            <option key={m} value={m}>
              {METHOD_LABELS[m]}
            </option>
          ))}
        </select>
      </div>
      <TextField label="Note for the shop floor" multiline value={stage.note ?? ''} onCommit={(note) => commit({ ...stage, note: note === '' ? undefined : note }, 'Note', 'note')} />
    </section>
  );
}
