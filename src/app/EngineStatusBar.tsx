// How the computation stands: up to date, computing (with progress and Stop), quick results shown
// while the cross-check runs, stopped, or failed. Told in words, not by colour alone.
import { MAIN_PLAN_ID } from '@/state/connectEngine';
import { useAppStore } from '@/state/useAppStore';

export function EngineStatusBar({ onStop, onRecompute }: { onStop: () => void; onRecompute: () => void }) {
  const status = useAppStore((s) => s.engineStatus);
  const message = useAppStore((s) => s.engineMessage);
  const progress = useAppStore((s) => s.progress);
  const lastRunMs = useAppStore((s) => s.lastRunMs);
  const stale = useAppStore((s) => s.shownRunId !== s.requestedRunId);
  const complete = useAppStore((s) => s.resultsComplete);
  const failure = useAppStore((s) => s.results[MAIN_PLAN_ID]?.failure ?? null);
  const ms = lastRunMs === null ? '' : ` (computed in ${Math.round(lastRunMs)} ms)`;
  return (
    <div className={`engine-status is-${status}`} role="status" aria-live="polite">
      {status === 'running' && (
        <>
          <span>{stale ? 'Computing…' : 'Quick results shown; solving again to the full tolerance and checking every stage with a second method…'}</span>
          {progress !== null && <progress max={1} value={progress} aria-label="Computation progress" />}
          {progress !== null && <span>{Math.round(progress * 100)} %</span>}
          <button type="button" onClick={onStop}>
            Stop
          </button>
        </>
      )}
      {status === 'idle' && !stale && complete && <span>✔ Results up to date and cross-checked{ms}</span>}
      {!stale && failure && (
        <strong className="status-failure">
          ✖ Stage {failure.index + 1} ({failure.name}) could not be computed; later stages were not run. The reason is in its stage report.
        </strong>
      )}
      {status === 'idle' && (stale || !complete) && <span>Waiting for results…</span>}
      {status === 'stopped' && (
        <>
          <span>{stale ? '■ Stopped: the results shown are for an earlier version of the plan.' : '■ Stopped: the results shown are not cross-checked.'}</span>
          <button type="button" onClick={onRecompute}>
            Compute again
          </button>
        </>
      )}
      {status === 'error' && (
        <>
          <span>✖ {message}</span>
          <button type="button" onClick={onRecompute}>
            Compute again
          </button>
        </>
      )}
    </div>
  );
}
