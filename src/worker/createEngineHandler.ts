// The worker's message handling, apart from the worker global so that tests can drive it in Node.
// One run at a time, one pass per run: quick (no cross-checks) or full (every stage checked by a
// second method), as the request says. Plans are computed one after another, yielding to the event
// loop between them so that a cancel message can get in. A run that is inside runPlan cannot hear
// a cancel: the client terminates the worker for that case (see createEngineClient).
import type { PlanK } from '@/schema/planSchema';
import type { PlanResult } from '@/engine/plan/planResult';
import { engineRequestSchema, type EngineResponse, type PlanRunResult } from './engineMessages';

export type RunPlanFn = (plan: PlanK, options?: { crossCheck?: boolean; signal?: AbortSignal; onProgress?: (fraction: number) => void }) => PlanResult;

/** Progress messages are sent at most this often, so a fast run does not flood the UI thread. */
export const PROGRESS_INTERVAL_MS = 50;

const yieldToEvents = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

function issueText(issues: { path: PropertyKey[]; message: string }[]): string {
  return issues
    .slice(0, 5)
    .map((i) => `${i.path.map(String).join('.') || '(message)'}: ${i.message}`)
    .join('; ');
}

export function createEngineHandler(runPlan: RunPlanFn, post: (response: EngineResponse) => void, now: () => number = () => performance.now()) {
  const controllers = new Map<number, AbortController>();

  async function run(runId: number, crossCheck: boolean, plans: { id: string; plan: PlanK }[]) {
    const controller = new AbortController();
    controllers.set(runId, controller);
    const startMs = now();
    let lastProgressMs = -Infinity;
    const results: PlanRunResult[] = [];
    try {
      for (let i = 0; i < plans.length; i++) {
        // The first plan starts at once; each later one lets pending messages (a cancel) in first.
        if (i > 0) await yieldToEvents();
        if (controller.signal.aborted) return post({ kind: 'cancelled', runId });
        const onProgress = (fraction: number) => {
          const t = now();
          if (t - lastProgressMs < PROGRESS_INTERVAL_MS) return;
          lastProgressMs = t;
          post({ kind: 'progress', runId, fraction: Math.min(1, Math.max(0, (i + fraction) / plans.length)) });
        };
        results.push({ id: plans[i].id, result: runPlan(plans[i].plan, { crossCheck, signal: controller.signal, onProgress }) });
      }
      post({ kind: 'result', runId, complete: crossCheck, elapsedMs: now() - startMs, results });
    } catch (e) {
      if ((e as Error).name === 'AbortError') return post({ kind: 'cancelled', runId });
      post({ kind: 'error', runId, message: `The engine stopped with an error: ${(e as Error).message ?? String(e)}` });
    } finally {
      controllers.delete(runId);
    }
  }

  return async function handle(data: unknown): Promise<void> {
    const parsed = engineRequestSchema.safeParse(data);
    if (!parsed.success) {
      const runId = typeof data === 'object' && data !== null && Number.isInteger((data as { runId?: unknown }).runId) ? ((data as { runId: number }).runId) : null;
      post({ kind: 'error', runId, message: `The engine refused the request: ${issueText(parsed.error.issues)}` });
      return;
    }
    const request = parsed.data;
    if (request.kind === 'cancel') {
      controllers.get(request.runId)?.abort();
      return;
    }
    // Validated by planSchema with temperatureUnit 'K' enforced above.
    await run(request.runId, request.crossCheck, request.plans as { id: string; plan: PlanK }[]);
  };
}
