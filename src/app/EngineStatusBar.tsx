// How the computation stands: up to date, computing (with progress and Stop), stopped, or failed.
import { useAppStore } from '@/state/useAppStore';

export function EngineStatusBar({ onStop, onRecompute }: { onStop: () => void; onRecompute: () => void }) {
  const status = useAppStore((s) => s.engineStatus);
  const message = useAppStore((s) => s.engineMessage);
  const progress = useAppStore((s) => s.progress);
  const lastRunMs = useAppStore((s) => s.lastRunMs);
  const stale = useAppStore((s) => s.shownRunId !== s.requestedRunId);
  return (
    <div className={`engine-status is-${status}`} role="status" aria-live="polite">
      {status === 'running' && (
        <>
          <span>Computing…</span>
          {progress !== null && <progress max={1} value={progress} aria-label="Computation progress" />}
          {progress !== null && <span>{Math.round(progress * 100)} %</span>}
          <button type="button" onClick={onStop}>
            Stop
          </button>
        </>
      )}
      {status === 'idle' && !stale && <span>✔ Results up to date{lastRunMs !== null ? ` (computed in ${Math.round(lastRunMs)} ms)` : ''}</span>}
      {status === 'idle' && stale && <span>Waiting for results…</span>}
      {status === 'stopped' && (
        <>
          <span>■ Stopped: the results shown are for an earlier version of the plan.</span>
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
