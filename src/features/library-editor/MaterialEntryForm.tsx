// Save the part's material to the user's library: the numbers come from the plan (edit them in the
// part editor first); this form asks for the words, the id and the emissivity band.
import { useState } from 'react';
import type { Material } from '@/schema/planSchema';
import type { MaterialEntry } from '@/library/libraryEntrySchema';
import { parseMaterialEntry } from '@/library/parseLibraryEntry';
import { FractionField } from '@/features/part/FractionField';
import { TextField } from '@/features/part/TextField';
import { EntryIssues, type SaveOutcome } from './EntryIssues';
import { materialEntryFromPlan, materialWordsOf, type MaterialWords } from './materialEntryFromPlan';

export interface MaterialEntryFormProps {
  material: Material;
  /** Temperatures the plan spans (kelvin): a constant property is saved as flat over this range. */
  spanK: { lowK: number; highK: number };
  takenIds: ReadonlySet<string>;
  onSave: (entry: MaterialEntry) => void;
}

export function MaterialEntryForm({ material, spanK, takenIds, onSave }: MaterialEntryFormProps) {
  const [words, setWords] = useState<MaterialWords>(() => materialWordsOf(material));
  const [outcome, setOutcome] = useState<SaveOutcome>(null);
  const set = (patch: Partial<MaterialWords>) => {
    setWords((w) => ({ ...w, ...patch }));
    return null;
  };
  const setEmissivity = (patch: Partial<MaterialWords['emissivity']>) => set({ emissivity: { ...words.emissivity, ...patch } });
  return (
    <form
      className="group library-form"
      aria-labelledby="material-entry-heading"
      onSubmit={(e) => {
        e.preventDefault();
        const parsed = parseMaterialEntry(materialEntryFromPlan(material, words, spanK), takenIds);
        if (parsed.ok) onSave(parsed.entry);
        setOutcome(parsed.ok ? { kind: 'saved', name: parsed.entry.name } : { kind: 'refused', issues: parsed.issues });
      }}
    >
      <h3 id="material-entry-heading">Save the part’s material “{material.name}”</h3>
      <p className="hint">The property tables are taken from the part as they are now; edit them in the part editor first.</p>
      <TextField label="Name" value={words.name} onCommit={(name) => set({ name })} />
      <TextField label="Id (letters, digits, hyphens)" value={words.id} onCommit={(id) => set({ id })} />
      <TextField label="Description" multiline value={words.description} onCommit={(description) => set({ description })} />
      <TextField label="Source of the numbers" multiline value={words.source} onCommit={(source) => set({ source })} />
      <fieldset>
        <legend>Surface emissivity band</legend>
        <FractionField label="Lowest" value={words.emissivity.min} onCommit={(min) => setEmissivity({ min })} />
        <FractionField label="Highest" value={words.emissivity.max} onCommit={(max) => setEmissivity({ max })} />
        <FractionField label="Suggested" value={words.emissivity.suggested} onCommit={(suggested) => setEmissivity({ suggested })} />
        <TextField label="Emissivity source" value={words.emissivity.source} onCommit={(source) => setEmissivity({ source })} />
      </fieldset>
      <button type="submit">Save material to my library</button>
      <EntryIssues outcome={outcome} />
    </form>
  );
}
