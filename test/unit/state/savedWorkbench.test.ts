// The autosave round trip and what a damaged store does: a notice and the demo, never a throw.
import { describe, expect, it, vi } from 'vitest';
import demoPlan from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import { createAppStore } from '@/state/createAppStore';
import { SAVED_DOCUMENT_KEY, SAVED_UNIT_SYSTEM_KEY, readSavedWorkbench } from '@/state/savedWorkbench';
import { AUTOSAVE_DELAY_MS, startAutosave } from '@/state/startAutosave';
import { MemoryStorage } from './memoryStorage';

function demoDocument() {
  const parsed = parsePlan(demoPlan);
  if (!parsed.ok) throw new Error('demo plan invalid');
  return { main: parsed.plan, variants: [] };
}

describe('autosave', () => {
  it('writes after the quiet time and reads back the same kelvin plan and unit system', () => {
    vi.useFakeTimers();
    try {
      const storage = new MemoryStorage();
      const store = createAppStore({ document: demoDocument() });
      const autosave = startAutosave(store, storage);
      store.getState().setInitialTemperatureK(1100.5);
      store.getState().setUnitSystem('us');
      expect(storage.getItem(SAVED_DOCUMENT_KEY)).toBeNull();
      vi.advanceTimersByTime(AUTOSAVE_DELAY_MS);
      const loaded = readSavedWorkbench(storage);
      expect(loaded.notice).toBeNull();
      expect(loaded.unitSystem).toBe('us');
      expect(loaded.document?.main.initialTemperature).toBeCloseTo(1100.5, 9);
      expect(loaded.document?.main.stages).toEqual(store.getState().document.main.stages);
      autosave.stop();
    } finally {
      vi.useRealTimers();
    }
  });

  it('flush writes at once (page hide)', () => {
    const storage = new MemoryStorage();
    const store = createAppStore({ document: demoDocument() });
    const autosave = startAutosave(store, storage, 10_000);
    store.getState().renamePlan('kept on reload');
    autosave.flush();
    expect(readSavedWorkbench(storage).document?.main.name).toBe('kept on reload');
    autosave.stop();
  });

  it('reports a failed write instead of throwing (storage full)', () => {
    const store = createAppStore({ document: demoDocument() });
    const full = {
      setItem() {
        throw new Error('QuotaExceededError');
      },
    };
    const autosave = startAutosave(store, full, 0);
    store.getState().renamePlan('x');
    autosave.flush();
    expect(autosave.lastError()).toMatch(/QuotaExceededError/);
    expect(store.getState().saveProblem).toMatch(/Autosave failed \(QuotaExceededError\): edits since then are not kept/);
    autosave.stop();
  });
});

describe('reading a saved workbench', () => {
  it('nothing saved: no document, no notice', () => {
    expect(readSavedWorkbench(new MemoryStorage())).toEqual({ document: null, unitSystem: 'si', notice: null });
  });

  it.each([
    ['not JSON', '{"format": "coolstage-plan", '],
    ['wrong format', '{"format": "something-else"}'],
    ['bad plan inside', JSON.stringify({ format: 'coolstage-plan', version: 2, temperatureUnit: 'K', main: { name: 'x', part: {}, initialTemperature: 900, stages: [] }, variants: [] })],
  ])('%s: no document and a notice that names the fallback', (_, text) => {
    const storage = new MemoryStorage();
    storage.setItem(SAVED_DOCUMENT_KEY, text);
    storage.setItem(SAVED_UNIT_SYSTEM_KEY, 'us');
    const loaded = readSavedWorkbench(storage);
    expect(loaded.document).toBeNull();
    expect(loaded.unitSystem).toBe('us');
    expect(loaded.notice).toMatch(/damaged, so the demo plan was opened instead/);
  });

  it('blocked storage: a notice, not an exception', () => {
    const blocked = {
      getItem(): string | null {
        throw new Error('SecurityError');
      },
    };
    expect(readSavedWorkbench(blocked).notice).toMatch(/storage is blocked/);
  });
});
