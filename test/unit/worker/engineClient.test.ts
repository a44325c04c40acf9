// The UI side of the engine: a quick lane answers each edit at once, a check lane replaces that answer
// with the cross-checked one; the latest request wins, stale replies are dropped, a superseded check is
// ended at once, a superseded quick run that keeps going is ended after the grace time, Stop ends both.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import demoPlan from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import type { PlanResult } from '@/engine/plan/planResult';
import { CHECK_DELAY_MS, createEngineClient, QUICK_PASS_SHARE, SUPERSEDE_GRACE_MS, type EngineStatus } from '@/worker/createEngineClient';
import type { WorkerLike } from '@/worker/createWorkerLane';
import type { EngineRequest } from '@/worker/engineMessages';

class FakeWorker implements WorkerLike {
  posted: EngineRequest[] = [];
  terminated = false;
  onmessage: ((event: MessageEvent) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  postMessage(message: EngineRequest) {
    this.posted.push(message);
  }
  terminate() {
    this.terminated = true;
  }
  reply(data: unknown) {
    this.onmessage?.({ data } as MessageEvent);
  }
  lastRun() {
    const runs = this.posted.filter((m): m is Extract<EngineRequest, { kind: 'run' }> => m.kind === 'run');
    return runs[runs.length - 1];
  }
  answer(runId: number, complete: boolean, planName: string) {
    this.reply({ kind: 'result', runId, complete, elapsedMs: 3, results: [{ id: 'main', result: { planName } as PlanResult }] });
  }
}

const parsed = parsePlan(demoPlan);
if (!parsed.ok) throw new Error('demo plan invalid');
const plans = [{ id: 'main', plan: parsed.plan }];

function setup() {
  const workers: FakeWorker[] = [];
  const shown: string[] = [];
  const statuses: EngineStatus[] = [];
  const progress: number[] = [];
  const client = createEngineClient(
    () => {
      const w = new FakeWorker();
      workers.push(w);
      return w;
    },
    {
      onResults: (results, info) => shown.push(`${results[0].result.planName}${info.complete ? ' (checked)' : ''}`),
      onProgress: (f) => progress.push(f),
      onStatus: (s) => statuses.push(s),
    },
  );
  return { client, workers, shown, statuses, progress };
}

describe('engine client', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('shows the quick answer, then asks a second worker for the cross-checked one, idle after it', () => {
    const { client, workers, shown, statuses } = setup();
    const id = client.run(plans);
    const [quick] = workers;
    expect(quick.lastRun()).toMatchObject({ runId: id, crossCheck: false });
    quick.answer(id, false, 'quick');
    expect(shown).toEqual(['quick']);
    // The check waits for a pause in the editing.
    vi.advanceTimersByTime(CHECK_DELAY_MS - 1);
    expect(workers).toHaveLength(1);
    vi.advanceTimersByTime(1);
    const check = workers[1];
    expect(check.lastRun()).toMatchObject({ runId: id, crossCheck: true });
    expect(check.lastRun().plans).toBe(plans);
    check.answer(id, true, 'full');
    expect(shown).toEqual(['quick', 'full (checked)']);
    expect(statuses).toEqual(['running', 'idle']);
  });

  it('a new edit ends the check of the older plan at once and goes to the idle quick worker', () => {
    const { client, workers, shown } = setup();
    const first = client.run(plans);
    workers[0].answer(first, false, 'one');
    vi.advanceTimersByTime(CHECK_DELAY_MS);
    const second = client.run(plans);
    expect(workers[1].terminated).toBe(true);
    expect(workers[0].terminated).toBe(false);
    expect(workers[0].lastRun().runId).toBe(second);
    workers[1].answer(first, true, 'old check');
    workers[0].answer(second, false, 'two');
    vi.advanceTimersByTime(CHECK_DELAY_MS);
    // The check of the second plan runs in a fresh worker.
    expect(workers[2].lastRun()).toMatchObject({ runId: second, crossCheck: true });
    expect(shown).toEqual(['one', 'two']);
  });

  it('edits during a quick run wait behind it (the newest one only) and the superseded answer is dropped', () => {
    const { client, workers, shown } = setup();
    const first = client.run(plans);
    client.run(plans);
    const third = client.run(plans);
    const [quick] = workers;
    expect(quick.posted.map((m) => m.kind)).toEqual(['run', 'cancel', 'cancel']);
    quick.answer(first, false, 'stale');
    expect(shown).toEqual([]);
    expect(quick.lastRun().runId).toBe(third);
    // No check was asked for the superseded plan.
    expect(workers).toHaveLength(1);
    quick.answer(third, false, 'latest');
    expect(shown).toEqual(['latest']);
  });

  it('restarts the quick worker when a superseded quick run is still going after the grace time', () => {
    const { client, workers, shown } = setup();
    const first = client.run(plans);
    const second = client.run(plans);
    vi.advanceTimersByTime(SUPERSEDE_GRACE_MS - 1);
    expect(workers).toHaveLength(1);
    vi.advanceTimersByTime(1);
    expect(workers[0].terminated).toBe(true);
    expect(workers[1].lastRun()).toMatchObject({ runId: second, crossCheck: false });
    workers[0].answer(first, false, 'dead');
    workers[1].answer(second, false, 'fresh');
    expect(shown).toEqual(['fresh']);
  });

  it('Stop ends both workers, says stopped, and later replies are not shown', () => {
    const { client, workers, shown, statuses } = setup();
    const id = client.run(plans);
    workers[0].answer(id, false, 'quick');
    vi.advanceTimersByTime(CHECK_DELAY_MS);
    client.stop();
    expect(workers[0].terminated && workers[1].terminated).toBe(true);
    expect(statuses.at(-1)).toBe('stopped');
    workers[1].answer(id, true, 'late');
    expect(shown).toEqual(['quick']);
    const next = client.run(plans);
    expect(workers[2].lastRun().runId).toBe(next);
  });

  it('an edit during the pause before the check means no check is run for the older plan', () => {
    const { client, workers } = setup();
    const first = client.run(plans);
    workers[0].answer(first, false, 'one');
    vi.advanceTimersByTime(CHECK_DELAY_MS / 2);
    const second = client.run(plans);
    vi.advanceTimersByTime(CHECK_DELAY_MS);
    expect(workers).toHaveLength(1);
    expect(workers[0].lastRun().runId).toBe(second);
  });

  it('progress: the quick pass fills the first share of the bar, the check the rest', () => {
    const { client, workers, progress } = setup();
    const id = client.run(plans);
    workers[0].reply({ kind: 'progress', runId: id, fraction: 0.5 });
    workers[0].answer(id, false, 'q');
    vi.advanceTimersByTime(CHECK_DELAY_MS);
    workers[1].reply({ kind: 'progress', runId: id, fraction: 0.5 });
    expect(progress).toEqual([0.5 * QUICK_PASS_SHARE, QUICK_PASS_SHARE + 0.5 * (1 - QUICK_PASS_SHARE)]);
  });

  it('an engine error is an error status; a malformed reply too, and it is not shown', () => {
    const { client, workers, shown, statuses } = setup();
    const id = client.run(plans);
    workers[0].reply({ kind: 'error', runId: id, message: 'The engine stopped with an error: boom' });
    expect(statuses.at(-1)).toBe('error');
    const next = client.run(plans);
    workers[0].reply({ kind: 'result', runId: 'one' });
    expect(shown).toEqual([]);
    expect(statuses.at(-1)).toBe('error');
    expect(next).toBeGreaterThan(id);
  });
});
