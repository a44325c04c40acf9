// The UI side of the engine: two workers, so that the answer to an edit never waits for the check
// of an older plan. The quick lane runs each plan without cross-checks and its result is shown at
// once; the check lane then runs the same plan with every stage cross-checked and replaces it,
// starting CHECK_DELAY_MS after the quick answer (a pause in the editing).
// The latest request wins: a new edit ends the check lane's run at once (terminate; it restarts on
// its next run) and queues behind the quick lane's run, which gets SUPERSEDE_GRACE_MS to finish
// before that worker too is restarted. Replies of superseded runs are dropped. Stop ends both.
import type { PlanK } from '@/schema/planSchema';
import type { EngineRequest, EngineResponse, PlanRunResult } from './engineMessages';
import { createWorkerLane, type WorkerLike } from './createWorkerLane';

/** How long a superseded quick run may finish on its own before its worker is restarted. */
export const SUPERSEDE_GRACE_MS = 250;
/** The cross-check starts this long after the quick answer, so that while the user keeps editing it does not compete for the CPU. */
export const CHECK_DELAY_MS = 200;
/** Share of the progress bar given to the quick pass (it takes about a quarter of the full one). */
export const QUICK_PASS_SHARE = 0.25;

export type EngineStatus = 'idle' | 'running' | 'stopped' | 'error';

export interface ResultInfo {
  runId: number;
  elapsedMs: number;
  /** False for the quick pass (no cross-checks); the cross-checked results follow. */
  complete: boolean;
}

export interface EngineClientEvents {
  onResults(results: PlanRunResult[], info: ResultInfo): void;
  onProgress(fraction: number): void;
  onStatus(status: EngineStatus, message?: string): void;
}

export interface EngineClient {
  /** Ask for a run; returns its id. Supersedes any earlier request. */
  run(plans: { id: string; plan: PlanK }[]): number;
  /** End the current run now (the workers are restarted); its results are never shown. */
  stop(): void;
  dispose(): void;
}

type RunRequest = Extract<EngineRequest, { kind: 'run' }>;

export function createEngineClient(createWorker: () => WorkerLike, events: EngineClientEvents, graceMs = SUPERSEDE_GRACE_MS): EngineClient {
  let nextRunId = 1;
  /** The run whose results are wanted; anything else is stale. */
  let latest: { runId: number; plans: RunRequest['plans'] } | null = null;
  let quickWaiting: RunRequest | null = null;
  let graceTimer: ReturnType<typeof setTimeout> | null = null;
  let checkTimer: ReturnType<typeof setTimeout> | null = null;
  const clearCheckTimer = () => {
    if (checkTimer !== null) clearTimeout(checkTimer);
    checkTimer = null;
  };

  const clearGrace = () => {
    if (graceTimer !== null) clearTimeout(graceTimer);
    graceTimer = null;
  };
  const isLatest = (runId: number | null) => runId !== null && latest?.runId === runId;
  const failed = (message: string) => {
    clearCheckTimer();
    quick.restart();
    check.restart();
    quickWaiting = null;
    clearGrace();
    events.onStatus('error', message);
  };

  const sendWaitingQuick = () => {
    clearGrace();
    if (!quickWaiting) return;
    const next = quickWaiting;
    quickWaiting = null;
    quick.post(next);
  };

  const quick = createWorkerLane(
    createWorker,
    (reply: EngineResponse) => {
      if (reply.kind === 'progress') {
        if (isLatest(reply.runId)) events.onProgress(reply.fraction * QUICK_PASS_SHARE);
        return;
      }
      if (isLatest(reply.runId) && reply.kind === 'result' && latest) {
        events.onResults(reply.results, { runId: reply.runId, elapsedMs: reply.elapsedMs, complete: false });
        const request: RunRequest = { kind: 'run', runId: reply.runId, crossCheck: true, plans: latest.plans };
        clearCheckTimer();
        checkTimer = setTimeout(() => {
          checkTimer = null;
          if (isLatest(request.runId)) check.post(request);
        }, CHECK_DELAY_MS);
      } else if (isLatest(reply.runId) && reply.kind === 'error') {
        events.onStatus('error', reply.message);
      }
      sendWaitingQuick();
    },
    failed,
  );

  const check = createWorkerLane(
    createWorker,
    (reply: EngineResponse) => {
      if (!isLatest(reply.runId)) return;
      if (reply.kind === 'progress') events.onProgress(QUICK_PASS_SHARE + reply.fraction * (1 - QUICK_PASS_SHARE));
      else if (reply.kind === 'result') {
        events.onResults(reply.results, { runId: reply.runId, elapsedMs: reply.elapsedMs, complete: true });
        events.onStatus('idle');
      } else if (reply.kind === 'error') events.onStatus('error', reply.message);
    },
    failed,
  );

  return {
    run(plans) {
      const runId = nextRunId++;
      latest = { runId, plans };
      clearCheckTimer();
      // The check of an older plan is not worth waiting for.
      if (check.busyWith() !== null) check.restart();
      const request: RunRequest = { kind: 'run', runId, crossCheck: false, plans };
      events.onStatus('running');
      if (quick.busyWith() === null) {
        quick.post(request);
        return runId;
      }
      quickWaiting = request;
      quick.cancel();
      graceTimer ??= setTimeout(() => {
        graceTimer = null;
        if (quick.busyWith() === null || !quickWaiting) return;
        quick.restart();
        sendWaitingQuick();
      }, graceMs);
      return runId;
    },
    stop() {
      const busy = quick.busyWith() !== null || check.busyWith() !== null || quickWaiting !== null || checkTimer !== null;
      clearGrace();
      clearCheckTimer();
      quickWaiting = null;
      latest = null;
      quick.restart();
      check.restart();
      if (busy) events.onStatus('stopped');
    },
    dispose() {
      clearGrace();
      clearCheckTimer();
      quickWaiting = null;
      latest = null;
      quick.restart();
      check.restart();
    },
  };
}
