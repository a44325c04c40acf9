// What the engine found for the selected stage (method, Biot numbers, Fo, cross-check) and the
// plan's checks (warnings with their rules and advice) and its method table, from the method and warnings features.
import { useDeferredValue } from 'react';
import { MethodPanel } from '@/features/method/MethodPanel';
import { StageMethodTable } from '@/features/method/StageMethodTable';
import { WarningList } from '@/features/warnings/WarningList';
import { MAIN_PLAN_ID } from '@/state/connectEngine';
import { useAppStore } from '@/state/useAppStore';

export function StageReportPanel() {
  // Rendered after the charts of a new result (lower priority): the curves move first.
  const result = useDeferredValue(useAppStore((s) => s.results[MAIN_PLAN_ID] ?? null));
  const selected = useAppStore((s) => s.selectedStageIndex);
  const system = useAppStore((s) => s.unitSystem);
  const selectStage = useAppStore((s) => s.selectStage);
  const stage = result?.stages[selected] ?? null;
  return (
    <section className="panel" aria-labelledby="report-heading">
      <h2 id="report-heading">Stage {selected + 1} report</h2>
      {!result ? (
        <p className="stage-muted">The report appears when the first results arrive.</p>
      ) : stage ? (
        <MethodPanel stage={stage} points={result.points} system={system} />
      ) : (
        <p className="stage-muted">{result.failure && result.failure.index <= selected ? `Not computed: ${result.failure.message}` : 'No result for this stage yet.'}</p>
      )}
      {/* The standing safety note is the shell's, above every screen. */}
      {result && <WarningList result={result} showSafetyNote={false} />}
      {result && result.stages.length > 0 && <StageMethodTable result={result} system={system} selectedStageIndex={selected} onSelectStage={selectStage} />}
    </section>
  );
}
