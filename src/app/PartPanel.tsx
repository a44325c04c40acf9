// The part editor wired to the store.
import { useMemo } from 'react';
import { BUILT_IN_MATERIALS } from '@/library/builtInLibrary';
import { PartEditor } from '@/features/part/PartEditor';
import { useAppStore } from '@/state/useAppStore';

export function PartPanel() {
  const part = useAppStore((s) => s.document.main.part);
  const initialTemperatureK = useAppStore((s) => s.document.main.initialTemperature);
  const system = useAppStore((s) => s.unitSystem);
  const userMaterials = useAppStore((s) => s.userLibrary.materials);
  const materials = useMemo(() => [...BUILT_IN_MATERIALS, ...userMaterials], [userMaterials]);
  const setShape = useAppStore((s) => s.setShape);
  const setMaterial = useAppStore((s) => s.setMaterial);
  const setInitialTemperatureK = useAppStore((s) => s.setInitialTemperatureK);
  return (
    <PartEditor
      part={part}
      initialTemperatureK={initialTemperatureK}
      system={system}
      materials={materials}
      onShape={setShape}
      onMaterial={setMaterial}
      onInitialTemperature={setInitialTemperatureK}
    />
  );
}
