// Undo/redo over document edits: every edit is one step, keystrokes in one field merge, selection follows.
import { describe, expect, it } from 'vitest';
import demoPlan from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import type { PlanK } from '@/schema/planSchema';
import { createAppStore } from '@/state/createAppStore';
import { MERGE_WINDOW_MS } from '@/state/documentSlice';

function demo(): PlanK {
  const parsed = parsePlan(demoPlan);
  if (!parsed.ok) throw new Error('demo plan invalid');
  return parsed.plan;
}

function storeAt(clock: { ms: number }) {
  return createAppStore({ document: { main: demo(), variants: [] }, nowMs: () => clock.ms });
}

const hOf = (plan: PlanK, i: number) => {
  const ht = plan.stages[i].medium.heatTransfer;
  return ht.kind === 'constant' ? ht.hWPerM2K : null;
};

describe('document history', () => {
  it('undoes and redoes an h edit back to the exact earlier plan', () => {
    const clock = { ms: 0 };
    const store = storeAt(clock);
    const before = store.getState().document;
    const stage = before.main.stages[0];
    store.getState().updateStage(0, { ...stage, medium: { ...stage.medium, heatTransfer: { kind: 'constant', hWPerM2K: 55 } } }, 'h');
    expect(hOf(store.getState().document.main, 0)).toBe(55);
    store.getState().undo();
    expect(store.getState().document).toBe(before);
    store.getState().redo();
    expect(hOf(store.getState().document.main, 0)).toBe(55);
    expect(store.getState().redoStack).toHaveLength(0);
  });

  it('merges keystrokes of one field inside the merge window into one step, not outside it', () => {
    const clock = { ms: 0 };
    const store = storeAt(clock);
    const original = store.getState().document;
    const setH = (h: number) => {
      const s = store.getState().document.main.stages[0];
      store.getState().updateStage(0, { ...s, medium: { ...s.medium, heatTransfer: { kind: 'constant', hWPerM2K: h } } }, 'stage0.h');
    };
    setH(1);
    clock.ms += 100;
    setH(12);
    clock.ms += 100;
    setH(120);
    expect(store.getState().undoStack).toHaveLength(1);
    clock.ms += MERGE_WINDOW_MS + 1;
    setH(1200);
    expect(store.getState().undoStack).toHaveLength(2);
    store.getState().undo();
    expect(hOf(store.getState().document.main, 0)).toBe(120);
    store.getState().undo();
    expect(store.getState().document).toBe(original);
  });

  it('a new edit after undo clears the redo stack', () => {
    const store = storeAt({ ms: 0 });
    store.getState().addStage();
    store.getState().undo();
    expect(store.getState().redoStack).toHaveLength(1);
    store.getState().renamePlan('other name');
    expect(store.getState().redoStack).toHaveLength(0);
  });

  it('add, duplicate, move and remove keep the stage order and the selection on the moved stage', () => {
    const store = storeAt({ ms: 0 });
    const names = () => store.getState().document.main.stages.map((s) => s.name);
    const [a, b, c] = names();
    store.getState().selectStage(0);
    store.getState().duplicateStage(0);
    expect(names()).toEqual([a, `${a} (copy)`, b, c]);
    expect(store.getState().selectedStageIndex).toBe(1);
    store.getState().moveStage(1, 3);
    expect(names()).toEqual([a, b, c, `${a} (copy)`]);
    expect(store.getState().selectedStageIndex).toBe(3);
    store.getState().removeStage(3);
    expect(names()).toEqual([a, b, c]);
    expect(store.getState().selectedStageIndex).toBe(2);
    store.getState().addStage();
    expect(names()).toHaveLength(4);
    expect(store.getState().selectedStageIndex).toBe(3);
    // Four edits, four undo steps, back to the demo's three stages.
    for (let i = 0; i < 4; i++) store.getState().undo();
    expect(names()).toEqual([a, b, c]);
  });

  it('undo past a removed stage keeps the selection inside the chain', () => {
    const store = storeAt({ ms: 0 });
    store.getState().addStage();
    store.getState().selectStage(3);
    store.getState().undo();
    expect(store.getState().document.main.stages).toHaveLength(3);
    expect(store.getState().selectedStageIndex).toBe(2);
  });

  it('never removes the last stage', () => {
    const store = storeAt({ ms: 0 });
    store.getState().removeStage(0);
    store.getState().removeStage(0);
    store.getState().removeStage(0);
    expect(store.getState().document.main.stages).toHaveLength(1);
  });
});
