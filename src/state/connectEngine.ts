// Keeps results in step with the document: every document change asks the engine client for a
// run (the client supersedes older ones) and its replies are written into the store.
import type { PlanDocument } from '@/schema/planDocument';
import { createEngineClient, type EngineClient } from '@/worker/createEngineClient';
import type { WorkerLike } from '@/worker/createWorkerLane';
import type { AppStore } from './createAppStore';

export const MAIN_PLAN_ID = 'main';

export function plansOfDocument(document: PlanDocument) {
  return [{ id: MAIN_PLAN_ID, plan: document.main }, ...document.variants.map((v) => ({ id: v.id, plan: v.plan }))];
}

export function connectEngine(store: AppStore, createWorker: () => WorkerLike): { client: EngineClient; recompute(): void; disconnect(): void } {
  const client = createEngineClient(createWorker, {
    onResults: (results, info) => store.getState().receiveResults(results, info),
    onProgress: (fraction) => store.getState().setProgress(fraction),
    onStatus: (status, message) => store.getState().setEngineStatus(status, message),
  });
  const request = (document: PlanDocument) => store.getState().runRequested(client.run(plansOfDocument(document)));
  request(store.getState().document);
  const unsubscribe = store.subscribe((s, prev) => {
    if (s.document !== prev.document) request(s.document);
  });
  return {
    client,
    recompute: () => request(store.getState().document),
    disconnect() {
      unsubscribe();
      client.dispose();
    },
  };
}
