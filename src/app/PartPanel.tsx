// The part editor wired to the store.
import { BUILT_IN_MATERIALS } from '@/library/builtInLibrary';
import { PartEditor } from '@/features/part/PartEditor';
import { useAppStore } from '@/state/useAppStore';

export function PartPanel() {
  const part = useAppStore((s) => s.document.main.part);
  const initialTemperatureK = useAppStore((s) => s.document.main.initialTemperature);
  const system = useAppStore((s) => s.unitSystem);
  const setShape = useAppStore((s) => s.setShape);
  const setMaterial = useAppStore((s) => s.setMaterial);
  const setInitialTemperatureK = useAppStore((s) => s.setInitialTemperatureK);
  return (
    <PartEditor
      part={part}
      initialTemperatureK={initialTemperatureK}
      system={system}
      materials={BUILT_IN_MATERIALS}
      onShape={setShape}
      onMaterial={setMaterial}
      onInitialTemperature={setInitialTemperatureK}
    />
  );
}
