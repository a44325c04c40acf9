// The engine worker as Vite bundles it (a module worker in its own chunk).
import type { WorkerLike } from '@/worker/createWorkerLane';

export function createEngineWorker(): WorkerLike {
  return new Worker(new URL('../worker/engineWorker.ts', import.meta.url), { type: 'module', name: 'coolstage-engine' }) as unknown as WorkerLike;
}
