// Writes the document, unit system and the user's library entries to storage shortly after each change, and at once when
// the page is hidden or unloaded, so that a reload loses nothing.
import type { AppStore } from './createAppStore';
import { writeSavedWorkbench } from './savedWorkbench';
import { writeUserLibrary } from './savedUserLibrary';

/** Quiet time after the last edit before writing. */
export const AUTOSAVE_DELAY_MS = 300;

export interface Autosave {
  flush(): void;
  stop(): void;
  /** Message of the last failed write (storage full or blocked), else null. */
  lastError(): string | null;
}

export function startAutosave(store: AppStore, storage: Pick<Storage, 'setItem'>, delayMs = AUTOSAVE_DELAY_MS): Autosave {
  let timer: ReturnType<typeof setTimeout> | null = null;
  let error: string | null = null;
  const write = () => {
    timer = null;
    const { document, unitSystem, userLibrary } = store.getState();
    try {
      writeSavedWorkbench(storage, { document, unitSystem });
      writeUserLibrary(storage, userLibrary);
      error = null;
    } catch (e) {
      error = `Autosave failed (${(e as Error).message}): edits since then are not kept in this browser; save the plan to a file.`;
    }
    store.getState().setSaveProblem(error);
  };
  const unsubscribe = store.subscribe((s, prev) => {
    if (s.document === prev.document && s.unitSystem === prev.unitSystem && s.userLibrary === prev.userLibrary) return;
    if (timer !== null) clearTimeout(timer);
    timer = setTimeout(write, delayMs);
  });
  const flush = () => {
    if (timer === null) return;
    clearTimeout(timer);
    write();
  };
  return {
    flush,
    stop() {
      flush();
      unsubscribe();
    },
    lastError: () => error,
  };
}
