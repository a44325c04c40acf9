// One engine worker and the run it is busy with. Replies are checked for their envelope; replies of a
// run the lane is no longer busy with (cancelled, or from a worker since terminated) are dropped.
import { engineResponseSchema, type EngineRequest, type EngineResponse } from './engineMessages';

export interface WorkerLike {
  postMessage(message: EngineRequest): void;
  terminate(): void;
  onmessage: ((event: MessageEvent) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
}

export interface WorkerLane {
  /** The run in the worker, or null when idle. */
  busyWith(): number | null;
  post(request: Extract<EngineRequest, { kind: 'run' }>): void;
  /** Ask the run to stop where it can (between plans); it answers 'cancelled'. */
  cancel(): void;
  /** End the worker now (a new one starts with the next post). */
  restart(): void;
}

export function createWorkerLane(createWorker: () => WorkerLike, onReply: (reply: EngineResponse) => void, onFailure: (message: string) => void): WorkerLane {
  let worker: WorkerLike | null = null;
  let busy: number | null = null;

  const restart = () => {
    worker?.terminate();
    worker = null;
    busy = null;
  };

  const ensure = (): WorkerLike => {
    if (worker) return worker;
    const w = createWorker();
    w.onmessage = (event: MessageEvent) => {
      if (w !== worker) return;
      const parsed = engineResponseSchema.safeParse(event.data);
      if (!parsed.success) return onFailure('The engine sent a reply the workbench does not understand.');
      const reply = parsed.data;
      if (reply.runId !== busy) return;
      if (reply.kind !== 'progress') busy = null;
      onReply(reply);
    };
    w.onerror = (event: ErrorEvent) => {
      event.preventDefault?.();
      if (w !== worker) return;
      restart();
      onFailure(`The engine worker failed: ${event.message || 'unknown error'}. Edit the plan to try again.`);
    };
    worker = w;
    return w;
  };

  return {
    busyWith: () => busy,
    post(request) {
      busy = request.runId;
      ensure().postMessage(request);
    },
    cancel() {
      if (busy !== null) worker?.postMessage({ kind: 'cancel', runId: busy });
    },
    restart,
  };
}
