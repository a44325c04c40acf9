// The UI side of the engine worker. The latest request wins: at most one run is in the worker
// and at most one waits behind it (newer requests replace the waiting one). Replies of a run that
// a newer request superseded are dropped. Each run answers twice: a quick pass (shown at once) and
// the full, cross-checked pass. A superseded run that is already in its full pass, one still going
// after SUPERSEDE_GRACE_MS, and any run when the user presses Stop, is ended by terminating the
// worker and starting a new one.
import type { PlanK } from '@/schema/planSchema';
import { engineResponseSchema, type EngineRequest, type PlanRunResult } from './engineMessages';

/** How long a superseded run may finish on its own before the worker is restarted. */
export const SUPERSEDE_GRACE_MS = 250;

export interface WorkerLike {
  postMessage(message: EngineRequest): void;
  terminate(): void;
  onmessage: ((event: MessageEvent) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
}

export type EngineStatus = 'idle' | 'running' | 'stopped' | 'error';

export interface ResultInfo {
  runId: number;
  elapsedMs: number;
  /** False for the quick pass (no cross-checks); the full pass follows. */
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
  /** End the current run now (the worker is restarted); its results are never shown. */
  stop(): void;
  dispose(): void;
}

export function createEngineClient(createWorker: () => WorkerLike, events: EngineClientEvents, graceMs = SUPERSEDE_GRACE_MS): EngineClient {
  let worker: WorkerLike | null = null;
  let nextRunId = 1;
  let inFlight: number | null = null;
  /** True once the run in the worker has sent its quick pass and is doing the full one. */
  let inFullPass = false;
  let waiting: Extract<EngineRequest, { kind: 'run' }> | null = null;
  let graceTimer: ReturnType<typeof setTimeout> | null = null;

  const clearGrace = () => {
    if (graceTimer !== null) clearTimeout(graceTimer);
    graceTimer = null;
  };

  function send(request: Extract<EngineRequest, { kind: 'run' }>) {
    inFlight = request.runId;
    inFullPass = false;
    ensureWorker().postMessage(request);
    events.onStatus('running');
  }

  function finishInFlight() {
    inFlight = null;
    clearGrace();
    if (waiting) {
      const next = waiting;
      waiting = null;
      send(next);
    }
  }

  function restartWorker() {
    worker?.terminate();
    worker = null;
    inFlight = null;
  }

  function onMessage(event: MessageEvent) {
    const parsed = engineResponseSchema.safeParse(event.data);
    if (!parsed.success) {
      events.onStatus('error', 'The engine sent a reply the workbench does not understand.');
      return;
    }
    const reply = parsed.data;
    if (reply.runId !== inFlight) return; // from a run that was stopped or restarted away
    const superseded = waiting !== null;
    switch (reply.kind) {
      case 'progress':
        if (!superseded) events.onProgress(reply.fraction);
        return;
      case 'result':
        if (!superseded) events.onResults(reply.results, { runId: reply.runId, elapsedMs: reply.elapsedMs, complete: reply.complete });
        if (!reply.complete) {
          inFullPass = true;
          return;
        }
        break;
      case 'error':
        if (!superseded) events.onStatus('error', reply.message);
        break;
      case 'cancelled':
        break;
    }
    const wasLast = !superseded;
    finishInFlight();
    if (wasLast && reply.kind !== 'error') events.onStatus('idle');
  }

  function ensureWorker(): WorkerLike {
    if (worker) return worker;
    const w = createWorker();
    w.onmessage = onMessage;
    w.onerror = (event: ErrorEvent) => {
      event.preventDefault?.();
      restartWorker();
      waiting = null;
      clearGrace();
      events.onStatus('error', `The engine worker failed: ${event.message || 'unknown error'}. Edit the plan to try again.`);
    };
    worker = w;
    return w;
  }

  return {
    run(plans) {
      const request = { kind: 'run' as const, runId: nextRunId++, plans };
      if (inFlight === null) {
        send(request);
        return request.runId;
      }
      waiting = request;
      if (inFullPass) {
        // The quick answer is out; the check of an outdated plan is not worth waiting for.
        restartWorker();
        clearGrace();
        waiting = null;
        send(request);
        return request.runId;
      }
      worker?.postMessage({ kind: 'cancel', runId: inFlight });
      if (graceTimer === null) {
        graceTimer = setTimeout(() => {
          graceTimer = null;
          if (inFlight === null || !waiting) return;
          restartWorker();
          const next = waiting;
          waiting = null;
          send(next);
        }, graceMs);
      }
      return request.runId;
    },
    stop() {
      if (inFlight === null && !waiting) return;
      clearGrace();
      waiting = null;
      restartWorker();
      events.onStatus('stopped');
    },
    dispose() {
      clearGrace();
      waiting = null;
      restartWorker();
    },
  };
}
