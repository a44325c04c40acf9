// Start-up outside React: the saved workbench (or the demo), the store, the autosave and the
// engine worker. Returns what the shell needs and a notice if the saved state could not be used.
import { createAppStore, type AppStore } from '@/state/createAppStore';
import { readSavedWorkbench } from '@/state/savedWorkbench';
import { readUserLibrary } from '@/state/savedUserLibrary';
import { startAutosave, type Autosave } from '@/state/startAutosave';
import { connectEngine } from '@/state/connectEngine';
import type { EngineClient } from '@/worker/createEngineClient';
import type { WorkerLike } from '@/worker/createWorkerLane';
import { demoDocument } from './demoDocument';

export interface Workbench {
  store: AppStore;
  autosave: Autosave;
  engine: EngineClient;
  /** Run the engine again on the current document (after Stop or an error). */
  recompute(): void;
  /** Said once at start when the saved state was damaged or unreadable. */
  startNotice: string | null;
  stop(): void;
}

export function startWorkbench(storage: Pick<Storage, 'getItem' | 'setItem'>, createWorker: () => WorkerLike): Workbench {
  const loaded = readSavedWorkbench(storage);
  const library = readUserLibrary(storage);
  const store = createAppStore({ document: loaded.document ?? demoDocument(), unitSystem: loaded.unitSystem, userLibrary: library.library });
  const autosave = startAutosave(store, storage);
  const { client, recompute, disconnect } = connectEngine(store, createWorker);
  return {
    store,
    autosave,
    engine: client,
    recompute,
    startNotice: [loaded.notice, library.notice].filter(Boolean).join(' ') || null,
    stop() {
      autosave.stop();
      disconnect();
    },
  };
}
