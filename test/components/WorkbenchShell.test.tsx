// @vitest-environment jsdom
// The whole shell with a fake worker that answers each run with the hand-built shaft result
// (test/components/fixtures/quenchedShaftResult.ts) and plotly mocked through 'plotly-impl':
// an edit reaches the worker as a kelvin plan, results fill the chain and the report, Ctrl+Z
// and the Undo button take the edit back, Stop ends a run, a damaged save shows a notice.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import type { EngineRequest } from '@/worker/engineMessages';
import type { WorkerLike } from '@/worker/createWorkerLane';
import { SAVED_DOCUMENT_KEY } from '@/state/savedWorkbench';
import { CHECK_DELAY_MS } from '@/worker/createEngineClient';
import { quenchedShaftResult } from './fixtures/quenchedShaftResult';
import { MemoryStorage } from '../unit/state/memoryStorage';

const plotly = vi.hoisted(() => ({ react: vi.fn(() => Promise.resolve()), purge: vi.fn() }));
vi.mock('plotly-impl', () => ({ default: plotly }));

// Label queries over the whole shell (hundreds of inputs) are slow in jsdom on a shared 2-core machine.
vi.setConfig({ testTimeout: 30_000 });

const { App } = await import('@/app/App');
const { startWorkbench } = await import('@/app/startWorkbench');

/** Answers a run in a microtask unless told to hold it (to test Stop). */
class FakeWorker implements WorkerLike {
  static all: FakeWorker[] = [];
  static hold = false;
  runs: Extract<EngineRequest, { kind: 'run' }>[] = [];
  terminated = false;
  onmessage: ((event: MessageEvent) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  constructor() {
    FakeWorker.all.push(this);
  }
  postMessage(message: EngineRequest) {
    if (message.kind !== 'run') return;
    this.runs.push(message);
    if (FakeWorker.hold) return;
    queueMicrotask(() =>
      this.onmessage?.({ data: { kind: 'result', runId: message.runId, complete: message.crossCheck, elapsedMs: 4, results: [{ id: 'main', result: quenchedShaftResult }] } } as MessageEvent),
    );
  }
  terminate() {
    this.terminated = true;
  }
}

let stopWorkbench: (() => void) | null = null;
afterEach(() => {
  cleanup();
  stopWorkbench?.();
  FakeWorker.all = [];
  FakeWorker.hold = false;
});

async function openShell(storage = new MemoryStorage()) {
  const workbench = startWorkbench(storage, () => new FakeWorker());
  stopWorkbench = workbench.stop;
  render(<App workbench={workbench} />);
  await act(async () => {});
  // The cross-check starts after a short pause (CHECK_DELAY_MS).
  await act(() => new Promise((r) => setTimeout(r, CHECK_DELAY_MS + 20)));
  return { workbench, storage };
}

const stageBlocks = () => within(screen.getByRole('listbox', { name: 'Stages in order' })).getAllByRole('option');
const hInput = () => screen.getByLabelText('Heat transfer coefficient h (W/(m²·K))') as HTMLInputElement;

describe('workbench shell', () => {
  it('opens the demo, runs it in the worker and shows the computed durations in the chain', async () => {
    await openShell();
    // The quick worker ran the plan once; the check worker then ran it with cross-checks.
    const worker = FakeWorker.all[0];
    expect(worker.runs.map((r) => r.crossCheck)).toEqual([false]);
    expect(FakeWorker.all[1].runs.map((r) => r.crossCheck)).toEqual([true]);
    expect(worker.runs[0].plans[0].id).toBe('main');
    expect(worker.runs[0].plans[0].plan.temperatureUnit).toBe('K');
    expect(stageBlocks()[1].textContent).toMatch(/takes 3 min 03 s/);
    expect(screen.getByText(/Results up to date and cross-checked \(computed in 4 ms\)/)).toBeTruthy();
  });

  it('an h edit is sent to the worker; Ctrl+Z takes it back and sends the old plan again', async () => {
    await openShell();
    const worker = FakeWorker.all[0];
    const h = hInput();
    fireEvent.change(h, { target: { value: '42' } });
    await act(async () => {});
    const sent = worker.runs.at(-1)!.plans[0].plan.stages[0].medium.heatTransfer;
    expect(sent).toEqual({ kind: 'constant', hWPerM2K: 42 });
    // Undo while the field still has focus: the field shows the undone value.
    fireEvent.keyDown(window, { key: 'z', ctrlKey: true });
    await act(async () => {});
    expect(h.value).toBe('10');
    expect(worker.runs.at(-1)!.plans[0].plan.stages[0].medium.heatTransfer).toEqual({ kind: 'constant', hWPerM2K: 10 });
    fireEvent.keyDown(window, { key: 'y', ctrlKey: true });
    await act(async () => {});
    expect(h.value).toBe('42');
  });

  it('the Undo button is disabled until an edit, then undoes it', async () => {
    await openShell();
    const undo = screen.getByRole('button', { name: '↶ Undo' }) as HTMLButtonElement;
    expect(undo.disabled).toBe(true);
    fireEvent.click(screen.getByRole('button', { name: '+ Add stage after' }));
    await act(async () => {});
    expect(stageBlocks()).toHaveLength(4);
    expect(undo.disabled).toBe(false);
    fireEvent.click(undo);
    await act(async () => {});
    expect(stageBlocks()).toHaveLength(3);
  });

  it('a bad h leaves the plan alone: no run is sent and the field says why', async () => {
    await openShell();
    const worker = FakeWorker.all[0];
    const runsBefore = worker.runs.length;
    fireEvent.change(hInput(), { target: { value: '12 parsecs' } });
    await act(async () => {});
    expect(worker.runs).toHaveLength(runsBefore);
    expect(screen.getByRole('alert').textContent).toMatch(/Heat transfer coefficient h: unit "parsecs" is not known here/);
  });

  it('an empty plan name is refused with the schema message and the name is kept', async () => {
    const { workbench } = await openShell();
    const before = workbench.store.getState().document.main.name;
    fireEvent.change(screen.getByLabelText('Plan'), { target: { value: '' } });
    expect(screen.getByRole('alert').textContent).toBe('⚠ Plan name: plan name is empty.');
    expect(workbench.store.getState().document.main.name).toBe(before);
  });

  it('shows the warnings of the result with their rule in the stage report', async () => {
    await openShell();
    const report = screen.getByRole('region', { name: /report/ });
    expect(within(report).getByRole('heading', { name: 'Checks (3 raised)' })).toBeTruthy();
  });

  it('Stop during a long run terminates the worker and says the results are for an earlier plan', async () => {
    FakeWorker.hold = true;
    await openShell();
    expect(screen.getByText('Computing…')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Stop' }));
    await act(async () => {});
    expect(FakeWorker.all[0].terminated).toBe(true);
    expect(screen.getByText(/Stopped: the results shown are for an earlier version/)).toBeTruthy();
  });

  it('a damaged save opens the demo with a notice instead of failing', async () => {
    const storage = new MemoryStorage();
    storage.setItem(SAVED_DOCUMENT_KEY, '{"format":"coolstage-plan","version":2,');
    await openShell(storage);
    expect(screen.getByRole('alert').textContent).toMatch(/damaged, so the demo plan was opened instead/);
    expect(stageBlocks()).toHaveLength(3);
  });
});
