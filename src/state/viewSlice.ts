// What the user is looking at: the selected stage and the unit system. Not part of the document,
// not undoable; the unit system is remembered between sessions by the autosave.
import type { StateCreator } from 'zustand/vanilla';
import type { UnitSystem } from '@/features/units/unitSystem';
import type { AppState } from './appState';

export interface ViewSlice {
  selectedStageIndex: number;
  unitSystem: UnitSystem;
  /** Why the last autosave failed (storage full or blocked), or null when saving works. */
  saveProblem: string | null;
  selectStage(index: number): void;
  setUnitSystem(system: UnitSystem): void;
  setSaveProblem(problem: string | null): void;
}

export const createViewSlice =
  (unitSystem: UnitSystem): StateCreator<AppState, [], [], ViewSlice> =>
  (set, get) => ({
    selectedStageIndex: 0,
    unitSystem,
    saveProblem: null,
    selectStage(index) {
      const count = get().document.main.stages.length;
      set({ selectedStageIndex: Math.max(0, Math.min(count - 1, index)) });
    },
    setUnitSystem(system) {
      set({ unitSystem: system });
    },
    setSaveProblem(problem) {
      if (get().saveProblem !== problem) set({ saveProblem: problem });
    },
  });
