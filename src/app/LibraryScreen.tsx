// "My library": the materials and media the user saved, and forms to save the part's material and
// the selected stage's medium. Saved entries appear in the workbench's library pickers.
import { useMemo } from 'react';
import { BUILT_IN_MATERIALS, BUILT_IN_MEDIA } from '@/library/builtInLibrary';
import { MaterialEntryForm } from '@/features/library-editor/MaterialEntryForm';
import { MediumEntryForm } from '@/features/library-editor/MediumEntryForm';
import { UserEntryList } from '@/features/library-editor/UserEntryList';
import { useAppStore } from '@/state/useAppStore';

export function LibraryScreen() {
  const plan = useAppStore((s) => s.document.main);
  const selected = useAppStore((s) => s.selectedStageIndex);
  const system = useAppStore((s) => s.unitSystem);
  const library = useAppStore((s) => s.userLibrary);
  const saveUserMaterial = useAppStore((s) => s.saveUserMaterial);
  const saveUserMedium = useAppStore((s) => s.saveUserMedium);
  const removeUserMaterial = useAppStore((s) => s.removeUserMaterial);
  const removeUserMedium = useAppStore((s) => s.removeUserMedium);
  const stage = plan.stages[selected];
  // Built-in ids are never reused; a user's own id may be saved again (it replaces the entry).
  const builtInIds = useMemo(() => new Set([...BUILT_IN_MATERIALS, ...BUILT_IN_MEDIA].map((e) => e.id)), []);
  const materialIds = useMemo(() => new Set([...builtInIds, ...library.media.map((m) => m.id)]), [builtInIds, library.media]);
  const mediumIds = useMemo(() => new Set([...builtInIds, ...library.materials.map((m) => m.id)]), [builtInIds, library.materials]);
  const temperatures = [plan.initialTemperature, ...plan.stages.map((s) => s.medium.temperature)];
  const spanK = { lowK: Math.min(...temperatures), highK: Math.max(...temperatures) };
  return (
    <div className="library-screen">
      <section className="panel" aria-labelledby="my-materials-heading">
        <h2 id="my-materials-heading">My materials</h2>
        <UserEntryList title="Saved materials" entries={library.materials} onRemove={removeUserMaterial} />
        <MaterialEntryForm key={plan.part.material.name} material={plan.part.material} spanK={spanK} takenIds={materialIds} onSave={saveUserMaterial} />
      </section>
      <section className="panel" aria-labelledby="my-media-heading">
        <h2 id="my-media-heading">My media</h2>
        <UserEntryList title="Saved media" entries={library.media} onRemove={removeUserMedium} />
        <MediumEntryForm key={`${selected}-${stage.medium.name}`} medium={stage.medium} stageName={stage.name} system={system} takenIds={mediumIds} onSave={saveUserMedium} />
      </section>
      <p className="hint library-note">Saved entries are kept in this browser only. Check every number against its source before using it for a real part.</p>
    </div>
  );
}
