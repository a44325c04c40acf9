// The stage timeline wired to the store and the latest results.
import { StageTimeline } from '@/features/stages/StageTimeline';
import { MAIN_PLAN_ID } from '@/state/connectEngine';
import { MAX_STAGES } from '@/state/planEditSlice';
import { useAppStore } from '@/state/useAppStore';

export function StageChainPanel() {
  const stages = useAppStore((s) => s.document.main.stages);
  const result = useAppStore((s) => s.results[MAIN_PLAN_ID] ?? null);
  const stale = useAppStore((s) => s.shownRunId !== s.requestedRunId);
  const selectedIndex = useAppStore((s) => s.selectedStageIndex);
  const system = useAppStore((s) => s.unitSystem);
  const selectStage = useAppStore((s) => s.selectStage);
  const addStage = useAppStore((s) => s.addStage);
  const duplicateStage = useAppStore((s) => s.duplicateStage);
  const removeStage = useAppStore((s) => s.removeStage);
  const moveStage = useAppStore((s) => s.moveStage);
  // Results of another stage count belong to an older plan: sizes fall back to equal widths until new ones come.
  const matching = result && result.stages.length + (result.failure ? 1 : 0) <= stages.length ? result : null;
  return (
    <StageTimeline
      stages={stages}
      results={matching?.stages ?? null}
      failure={matching?.failure ?? null}
      stale={stale}
      selectedIndex={selectedIndex}
      system={system}
      maxStages={MAX_STAGES}
      onSelect={selectStage}
      onAdd={addStage}
      onDuplicate={duplicateStage}
      onRemove={removeStage}
      onMove={moveStage}
    />
  );
}
