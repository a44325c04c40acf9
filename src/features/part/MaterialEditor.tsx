// The part's material: pick one from the library (built-in or saved by the user) or edit the
// plan's own. Editing a library material's numbers makes it the plan's own ("edited").
import { materialSchema, type Material, type PropertyInput } from '@/schema/planSchema';
import type { MaterialEntry } from '@/library/libraryEntrySchema';
import { materialFromLibrary } from '@/library/libraryToPlan';
import type { UnitSystem } from '@/features/units/unitSystem';
import { PropertyEditor } from './PropertyEditor';
import { TextField } from './TextField';
import { validateEdit } from './validateEdit';

const OWN_MATERIAL = '';

export interface MaterialEditorProps {
  material: Material;
  library: readonly MaterialEntry[];
  system: UnitSystem;
  onChange: (material: Material, mergeKey?: string) => void;
}

export function MaterialEditor({ material, library, system, onChange }: MaterialEditorProps) {
  const fromLibrary = library.find((e) => e.id === material.libraryId);
  const editProperty = (key: 'conductivityWPerMK' | 'densityKgPerM3' | 'specificHeatJPerKgK') => (value: PropertyInput, mergeKey: string) => {
    const own: Material = fromLibrary
      ? { ...material, libraryId: undefined, name: `${material.name} (edited)`.slice(0, 120), source: `user data, edited from ${material.source}`.slice(0, 400) }
      : material;
    onChange({ ...own, [key]: value }, `material.${mergeKey}`);
  };
  return (
    <fieldset className="group">
      <legend>Material</legend>
      <div className="field">
        <label htmlFor="material-pick">From the library</label>
        <select
          id="material-pick"
          value={fromLibrary ? fromLibrary.id : OWN_MATERIAL}
          onChange={(e) => {
            const entry = library.find((m) => m.id === e.target.value);
            if (entry) onChange(materialFromLibrary(entry));
          }}
        >
          {!fromLibrary && <option value={OWN_MATERIAL}>this plan's own material</option>}
          {library.map((m) => (
            <option key={m.id} value={m.id}>
              {m.name}
            </option>
          ))}
        </select>
      </div>
      <TextField
        label="Material name"
        value={material.name}
        onCommit={(name) => {
          const checked = validateEdit(materialSchema, { ...material, name }, 'Material name');
          if (!checked.ok) return checked.message;
          onChange(checked.value, 'material.name');
          return null;
        }}
      />
      <p className="source-line">Source: {material.source}</p>
      <PropertyEditor label="Conductivity" kind="conductivity" value={material.conductivityWPerMK} system={system} onChange={editProperty('conductivityWPerMK')} />
      <PropertyEditor label="Density" kind="density" value={material.densityKgPerM3} system={system} onChange={editProperty('densityKgPerM3')} />
      <PropertyEditor label="Specific heat" kind="specificHeat" value={material.specificHeatJPerKgK} system={system} onChange={editProperty('specificHeatJPerKgK')} />
    </fieldset>
  );
}
