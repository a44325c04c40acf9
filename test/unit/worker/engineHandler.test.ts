// The worker's side: requests validated with the plan schema, results per plan id, progress
// throttled, cancel heard between plans, engine exceptions turned into an error reply.
import { describe, expect, it } from 'vitest';
import demoPlan from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import type { PlanK } from '@/schema/planSchema';
import type { PlanResult } from '@/engine/plan/planResult';
import { createEngineHandler, PROGRESS_INTERVAL_MS, type RunPlanFn } from '@/worker/createEngineHandler';
import type { EngineResponse } from '@/worker/engineMessages';

const parsed = parsePlan(demoPlan);
if (!parsed.ok) throw new Error('demo plan invalid');
const plan = parsed.plan;

function harness(runPlan: RunPlanFn, clock = { ms: 0 }) {
  const replies: EngineResponse[] = [];
  const handle = createEngineHandler(runPlan, (r) => replies.push(r), () => clock.ms);
  return { handle, replies, clock };
}

const echoName: RunPlanFn = (p: PlanK) => ({ planName: p.name }) as PlanResult;

describe('engine worker handler', () => {
  it.each([false, true])('crossCheck %s: one pass with that flag, one result per plan keyed by id', async (crossCheck) => {
    const calls: (boolean | undefined)[] = [];
    const { handle, replies } = harness((p, options) => {
      calls.push(options?.crossCheck);
      return echoName(p);
    });
    await handle({ kind: 'run', runId: 7, crossCheck, plans: [{ id: 'main', plan }, { id: 'v1', plan: { ...plan, name: 'variant one' } }] });
    expect(calls).toEqual([crossCheck, crossCheck]);
    expect(replies).toHaveLength(1);
    const reply = replies[0];
    if (reply.kind !== 'result') throw new Error(`expected a result, got ${reply.kind}`);
    expect([reply.runId, reply.complete]).toEqual([7, crossCheck]);
    expect(reply.results.map((r) => [r.id, r.result.planName])).toEqual([
      ['main', plan.name],
      ['v1', 'variant one'],
    ]);
  });

  it('refuses a run without the crossCheck flag', async () => {
    const { handle, replies } = harness(echoName);
    await handle({ kind: 'run', runId: 8, plans: [{ id: 'main', plan }] });
    expect(replies[0]).toMatchObject({ kind: 'error', runId: 8, message: expect.stringMatching(/crossCheck/) });
  });

  it('refuses a plan that fails the plan schema, naming the field', async () => {
    const { handle, replies } = harness(echoName);
    const bad = { ...plan, stages: [] };
    await handle({ kind: 'run', runId: 3, crossCheck: false, plans: [{ id: 'main', plan: bad }] });
    expect(replies).toEqual([{ kind: 'error', runId: 3, message: expect.stringMatching(/stages.*at least one stage/) }]);
  });

  it('refuses a plan in degC: the worker takes kelvin only', async () => {
    const { handle, replies } = harness(echoName);
    await handle({ kind: 'run', runId: 4, crossCheck: false, plans: [{ id: 'main', plan: demoPlan }] });
    expect(replies[0]).toMatchObject({ kind: 'error', runId: 4, message: expect.stringMatching(/kelvin/) });
  });

  it('refuses an unknown message kind', async () => {
    const { handle, replies } = harness(echoName);
    await handle({ kind: 'explode' });
    expect(replies[0]).toMatchObject({ kind: 'error', runId: null });
  });

  it('a cancel that arrives between plans ends the run without a result', async () => {
    let calls = 0;
    const { handle, replies } = harness((p) => {
      calls++;
      return echoName(p);
    });
    const running = handle({ kind: 'run', runId: 1, crossCheck: false, plans: [{ id: 'main', plan }, { id: 'v1', plan }] });
    await handle({ kind: 'cancel', runId: 1 });
    await running;
    expect(calls).toBe(1);
    expect(replies).toEqual([{ kind: 'cancelled', runId: 1 }]);
  });

  it('an engine AbortError is a cancellation, not an error', async () => {
    const { handle, replies } = harness(() => {
      const e = new Error('The computation was stopped.');
      e.name = 'AbortError';
      throw e;
    });
    await handle({ kind: 'run', runId: 6, crossCheck: false, plans: [{ id: 'main', plan }] });
    expect(replies).toEqual([{ kind: 'cancelled', runId: 6 }]);
  });

  it('sends progress at most once per interval, scaled over the plans of the run', async () => {
    const clock = { ms: 0 };
    const { handle, replies } = harness((p, options) => {
      for (const f of [0, 0.5, 1]) {
        options?.onProgress?.(f);
        clock.ms += PROGRESS_INTERVAL_MS / 2;
      }
      return echoName(p);
    }, clock);
    await handle({ kind: 'run', runId: 2, crossCheck: false, plans: [{ id: 'main', plan }, { id: 'v1', plan }] });
    const fractions = replies.filter((r) => r.kind === 'progress').map((r) => (r.kind === 'progress' ? r.fraction : NaN));
    // Each runPlan call reports 0, 0.5, 1 at 25 ms steps: 6 calls at t = 0, 25, ..., 125 ms, overall
    // 0, 0.25, 0.5 (plan 1) and 0.5, 0.75, 1 (plan 2). Only calls at least 50 ms after the last one sent
    // go out: t = 0, 50, 100 ms.
    expect(fractions).toEqual([0, 0.5, 0.75]);
  });

  it('turns an exception in the engine into an error reply', async () => {
    const { handle, replies } = harness(() => {
      throw new Error('matrix went singular');
    });
    await handle({ kind: 'run', runId: 9, crossCheck: false, plans: [{ id: 'main', plan }] });
    expect(replies).toEqual([{ kind: 'error', runId: 9, message: 'The engine stopped with an error: matrix went singular' }]);
  });
});
