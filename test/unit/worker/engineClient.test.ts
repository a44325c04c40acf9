// The UI side of the worker: the latest request wins, stale replies are dropped, a superseded run
// that keeps going is ended by a worker restart, Stop restarts at once.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import demoPlan from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import type { PlanResult } from '@/engine/plan/planResult';
import { createEngineClient, SUPERSEDE_GRACE_MS, type EngineStatus, type WorkerLike } from '@/worker/createEngineClient';
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
  lastRunId() {
    const runs = this.posted.filter((m) => m.kind === 'run');
    return runs[runs.length - 1].runId;
  }
}

const parsed = parsePlan(demoPlan);
if (!parsed.ok) throw new Error('demo plan invalid');
const plan = parsed.plan;
const resultNamed = (planName: string) => ({ planName }) as PlanResult;

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
      onResults: (results) => shown.push(results[0].result.planName),
      onProgress: (f) => progress.push(f),
      onStatus: (s) => statuses.push(s),
    },
  );
  return { client, workers, shown, statuses, progress };
}

describe('engine client', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('shows the result of a single run and goes idle', () => {
    const { client, workers, shown, statuses } = setup();
    const id = client.run([{ id: 'main', plan }]);
    workers[0].reply({ kind: 'result', runId: id, complete: true, elapsedMs: 3, results: [{ id: 'main', result: resultNamed('first') }] });
    expect(shown).toEqual(['first']);
    expect(statuses).toEqual(['running', 'idle']);
  });

  it('keeps one run in the worker, replaces the waiting one, and drops the superseded reply', () => {
    const { client, workers, shown } = setup();
    const first = client.run([{ id: 'main', plan }]);
    client.run([{ id: 'main', plan }]);
    const third = client.run([{ id: 'main', plan }]);
    const w = workers[0];
    // First run posted, then one cancel per superseding request; the waiting request is not posted yet.
    expect(w.posted.map((m) => m.kind)).toEqual(['run', 'cancel', 'cancel']);
    w.reply({ kind: 'result', runId: first, complete: true, elapsedMs: 3, results: [{ id: 'main', result: resultNamed('stale') }] });
    expect(shown).toEqual([]);
    expect(w.lastRunId()).toBe(third);
    w.reply({ kind: 'result', runId: third, complete: true, elapsedMs: 3, results: [{ id: 'main', result: resultNamed('latest') }] });
    expect(shown).toEqual(['latest']);
  });

  it('restarts the worker when a superseded run is still going after the grace time', () => {
    const { client, workers, shown } = setup();
    const first = client.run([{ id: 'main', plan }]);
    const second = client.run([{ id: 'main', plan }]);
    vi.advanceTimersByTime(SUPERSEDE_GRACE_MS - 1);
    expect(workers).toHaveLength(1);
    vi.advanceTimersByTime(1);
    expect(workers[0].terminated).toBe(true);
    expect(workers).toHaveLength(2);
    expect(workers[1].lastRunId()).toBe(second);
    // A late reply from the dead worker's run is not shown.
    workers[0].reply({ kind: 'result', runId: first, complete: true, elapsedMs: 3, results: [{ id: 'main', result: resultNamed('dead') }] });
    workers[1].reply({ kind: 'result', runId: second, complete: true, elapsedMs: 3, results: [{ id: 'main', result: resultNamed('fresh') }] });
    expect(shown).toEqual(['fresh']);
  });

  it('Stop terminates the running worker, reports stopped, and ignores its later replies', () => {
    const { client, workers, shown, statuses } = setup();
    const id = client.run([{ id: 'main', plan }]);
    workers[0].reply({ kind: 'progress', runId: id, fraction: 0.4 });
    client.stop();
    expect(workers[0].terminated).toBe(true);
    expect(statuses.at(-1)).toBe('stopped');
    workers[0].reply({ kind: 'result', runId: id, complete: true, elapsedMs: 3, results: [{ id: 'main', result: resultNamed('late') }] });
    expect(shown).toEqual([]);
    // The next request gets a fresh worker.
    const next = client.run([{ id: 'main', plan }]);
    expect(workers[1].lastRunId()).toBe(next);
  });

  it('shows the quick pass at once and the full pass after it, idle only after the full one', () => {
    const { client, workers, shown, statuses } = setup();
    const id = client.run([{ id: 'main', plan }]);
    workers[0].reply({ kind: 'result', runId: id, complete: false, elapsedMs: 1, results: [{ id: 'main', result: resultNamed('quick') }] });
    expect(shown).toEqual(['quick']);
    expect(statuses).toEqual(['running']);
    workers[0].reply({ kind: 'result', runId: id, complete: true, elapsedMs: 3, results: [{ id: 'main', result: resultNamed('checked') }] });
    expect(shown).toEqual(['quick', 'checked']);
    expect(statuses).toEqual(['running', 'idle']);
  });

  it('a new request during the full pass restarts the worker at once instead of waiting for the check', () => {
    const { client, workers, shown } = setup();
    const first = client.run([{ id: 'main', plan }]);
    workers[0].reply({ kind: 'result', runId: first, complete: false, elapsedMs: 1, results: [{ id: 'main', result: resultNamed('quick one') }] });
    const second = client.run([{ id: 'main', plan }]);
    expect(workers[0].terminated).toBe(true);
    expect(workers[1].lastRunId()).toBe(second);
    workers[0].reply({ kind: 'result', runId: first, complete: true, elapsedMs: 3, results: [{ id: 'main', result: resultNamed('old check') }] });
    workers[1].reply({ kind: 'result', runId: second, complete: false, elapsedMs: 1, results: [{ id: 'main', result: resultNamed('quick two') }] });
    expect(shown).toEqual(['quick one', 'quick two']);
  });

  it('passes progress of the current run and an engine error as an error status', () => {
    const { client, workers, progress, statuses } = setup();
    const id = client.run([{ id: 'main', plan }]);
    workers[0].reply({ kind: 'progress', runId: id, fraction: 0.25 });
    workers[0].reply({ kind: 'error', runId: id, message: 'The engine stopped with an error: boom' });
    expect(progress).toEqual([0.25]);
    expect(statuses.at(-1)).toBe('error');
  });

  it('treats a malformed reply as an error, not a result', () => {
    const { client, workers, shown, statuses } = setup();
    client.run([{ id: 'main', plan }]);
    workers[0].reply({ kind: 'result', runId: 'one' });
    expect(shown).toEqual([]);
    expect(statuses.at(-1)).toBe('error');
  });
});
