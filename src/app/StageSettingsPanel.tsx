// The selected stage's editor wired to the store.
import { useMemo } from 'react';
import { geometryOf } from '@/engine/geometry/geometry';
import { BUILT_IN_MATERIALS, BUILT_IN_MEDIA } from '@/library/builtInLibrary';
import { StageEditor } from '@/features/stages/StageEditor';
import { useAppStore } from '@/state/useAppStore';

export function StageSettingsPanel() {
  const index = useAppStore((s) => s.selectedStageIndex);
  const stage = useAppStore((s) => s.document.main.stages[s.selectedStageIndex]);
  const shape = useAppStore((s) => s.document.main.part.shape);
  const material = useAppStore((s) => s.document.main.part.material);
  const system = useAppStore((s) => s.unitSystem);
  const userLibrary = useAppStore((s) => s.userLibrary);
  const media = useMemo(() => [...BUILT_IN_MEDIA, ...userLibrary.media], [userLibrary.media]);
  const materials = useMemo(() => [...BUILT_IN_MATERIALS, ...userLibrary.materials], [userLibrary.materials]);
  const updateStage = useAppStore((s) => s.updateStage);
  // Which points a shape reports is geometry bookkeeping, not physics: the same list the engine reports.
  const geometry = geometryOf(shape);
  return (
    <StageEditor
      key={index}
      stage={stage}
      index={index}
      material={material}
      points={geometry.points}
      oneD={geometry.oneD !== null}
      media={media}
      materials={materials}
      system={system}
      onChange={(next, mergeKey) => updateStage(index, next, mergeKey)}
    />
  );
}
