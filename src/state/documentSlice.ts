// The document (main plan + variants, kelvin) and its edit history. Every edit goes through
// commitDocument, so undo and redo cover all of them. Edits of one field typed in quick
// succession share a merge key and become one undo step.
import type { StateCreator } from 'zustand/vanilla';
import type { PlanDocument } from '@/schema/planDocument';
import type { AppState } from './appState';

/** Oldest steps are forgotten beyond this many. */
export const MAX_UNDO_STEPS = 200;
/** Edits with the same merge key closer together than this become one undo step. */
export const MERGE_WINDOW_MS = 1500;

export interface DocumentSlice {
  document: PlanDocument;
  undoStack: PlanDocument[];
  redoStack: PlanDocument[];
  lastMerge: { key: string; atMs: number } | null;
  commitDocument(next: PlanDocument, mergeKey?: string): void;
  undo(): void;
  redo(): void;
  /** Start over from a document (app start): history is cleared. */
  resetDocument(document: PlanDocument): void;
}

const clampSelection = (selected: number, document: PlanDocument) => Math.min(selected, document.main.stages.length - 1);

export const createDocumentSlice =
  (initial: PlanDocument, nowMs: () => number = () => Date.now()): StateCreator<AppState, [], [], DocumentSlice> =>
  (set, get) => ({
    document: initial,
    undoStack: [],
    redoStack: [],
    lastMerge: null,
    commitDocument(next, mergeKey) {
      const { document, undoStack, lastMerge } = get();
      if (next === document) return;
      const atMs = nowMs();
      const merging = mergeKey !== undefined && lastMerge?.key === mergeKey && atMs - lastMerge.atMs < MERGE_WINDOW_MS && undoStack.length > 0;
      set({
        document: next,
        undoStack: merging ? undoStack : [...undoStack, document].slice(-MAX_UNDO_STEPS),
        redoStack: [],
        lastMerge: mergeKey === undefined ? null : { key: mergeKey, atMs },
        selectedStageIndex: clampSelection(get().selectedStageIndex, next),
      });
    },
    undo() {
      const { undoStack, redoStack, document } = get();
      const previous = undoStack.at(-1);
      if (!previous) return;
      set({ document: previous, undoStack: undoStack.slice(0, -1), redoStack: [...redoStack, document], lastMerge: null, selectedStageIndex: clampSelection(get().selectedStageIndex, previous) });
    },
    redo() {
      const { undoStack, redoStack, document } = get();
      const next = redoStack.at(-1);
      if (!next) return;
      set({ document: next, undoStack: [...undoStack, document], redoStack: redoStack.slice(0, -1), lastMerge: null, selectedStageIndex: clampSelection(get().selectedStageIndex, next) });
    },
    resetDocument(document) {
      set({ document, undoStack: [], redoStack: [], lastMerge: null, selectedStageIndex: 0 });
    },
  });
