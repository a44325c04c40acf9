// Save the selected stage's medium to the user's library: temperature and h (or h table) come from
// the stage; this form asks for the words, the bands and the cautions.
import { useState } from 'react';
import type { Medium } from '@/schema/planSchema';
import type { MediumEntry } from '@/library/libraryEntrySchema';
import { parseMediumEntry } from '@/library/parseLibraryEntry';
import type { UnitSystem } from '@/features/units/unitSystem';
import type { QuantityKind } from '@/features/units/quantityUnits';
import { QuantityField } from '@/features/part/QuantityField';
import { TextField } from '@/features/part/TextField';
import { EntryIssues, type SaveOutcome } from './EntryIssues';
import { mediumEntryFromPlan, mediumWordsOf, type MediumWords } from './mediumEntryFromPlan';

export interface MediumEntryFormProps {
  medium: Medium;
  stageName: string;
  system: UnitSystem;
  takenIds: ReadonlySet<string>;
  onSave: (entry: MediumEntry) => void;
}

type Band = MediumWords['hWPerM2K'];

function BandFields({ legend, kind, band, system, onChange }: { legend: string; kind: QuantityKind; band: Band; system: UnitSystem; onChange: (b: Band) => null }) {
  return (
    <fieldset>
      <legend>{legend}</legend>
      <QuantityField label={`${legend}, lowest`} kind={kind} valueSI={band.min} system={system} onCommit={(min) => onChange({ ...band, min })} />
      <QuantityField label={`${legend}, highest`} kind={kind} valueSI={band.max} system={system} onCommit={(max) => onChange({ ...band, max })} />
      <QuantityField label={`${legend}, suggested`} kind={kind} valueSI={band.suggested} system={system} onCommit={(suggested) => onChange({ ...band, suggested })} />
      <TextField label={`${legend}, source`} value={band.source} onCommit={(source) => onChange({ ...band, source })} />
    </fieldset>
  );
}

export function MediumEntryForm({ medium, stageName, system, takenIds, onSave }: MediumEntryFormProps) {
  const [words, setWords] = useState<MediumWords>(() => mediumWordsOf(medium));
  const [outcome, setOutcome] = useState<SaveOutcome>(null);
  const set = (patch: Partial<MediumWords>) => {
    setWords((w) => ({ ...w, ...patch }));
    return null;
  };
  return (
    <form
      className="group library-form"
      aria-labelledby="medium-entry-heading"
      onSubmit={(e) => {
        e.preventDefault();
        const parsed = parseMediumEntry(mediumEntryFromPlan(medium, words), takenIds);
        if (parsed.ok) onSave(parsed.entry);
        setOutcome(parsed.ok ? { kind: 'saved', name: parsed.entry.name } : { kind: 'refused', issues: parsed.issues });
      }}
    >
      <h3 id="medium-entry-heading">
        Save the medium “{medium.name}” of stage “{stageName}”
      </h3>
      <p className="hint">Its temperature and h {medium.heatTransfer.kind === 'surface-table' ? 'table' : ''} are taken from the stage as they are now.</p>
      <TextField label="Name" value={words.name} onCommit={(name) => set({ name })} />
      <TextField label="Id (letters, digits, hyphens)" value={words.id} onCommit={(id) => set({ id })} />
      <TextField label="Description" multiline value={words.description} onCommit={(description) => set({ description })} />
      <div className="field">
        <label htmlFor="medium-entry-phase">Phase</label>
        <select id="medium-entry-phase" value={words.phase} onChange={(e) => set({ phase: e.target.value as MediumWords['phase'] })}>
          <option value="gas">gas</option>
          <option value="liquid">liquid</option>
        </select>
      </div>
      <BandFields legend="Medium temperature" kind="temperature" band={words.temperatureK} system={system} onChange={(temperatureK) => set({ temperatureK })} />
      <BandFields legend="Heat transfer coefficient" kind="heatTransferCoefficient" band={words.hWPerM2K} system={system} onChange={(hWPerM2K) => set({ hWPerM2K })} />
      <div className="field field-check">
        <input id="medium-entry-radiation" type="checkbox" checked={words.radiationMatters} onChange={(e) => set({ radiationMatters: e.target.checked })} />
        <label htmlFor="medium-entry-radiation">Radiation matters next to convection (gases around hot parts)</label>
      </div>
      {medium.heatTransfer.kind === 'surface-table' && (
        <fieldset>
          <legend>Boiling curve</legend>
          <TextField label="Curve label (what it is, where it comes from)" multiline value={words.curve.label} onCommit={(label) => set({ curve: { ...words.curve, label } })} />
          <QuantityField label="Convection only below" kind="temperature" valueSI={words.curve.convectionBelowK} system={system} onCommit={(convectionBelowK) => set({ curve: { ...words.curve, convectionBelowK } })} />
          <QuantityField label="Film boiling above" kind="temperature" valueSI={words.curve.filmAboveK} system={system} onCommit={(filmAboveK) => set({ curve: { ...words.curve, filmAboveK } })} />
        </fieldset>
      )}
      <TextField label="Cautions (one per line)" multiline value={words.cautions} onCommit={(cautions) => set({ cautions })} />
      <button type="submit">Save medium to my library</button>
      <EntryIssues outcome={outcome} />
    </form>
  );
}
