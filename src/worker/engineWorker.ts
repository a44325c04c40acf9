/// <reference lib="webworker" />
// Worker entry: the engine runs here, never on the UI thread.
import { runPlan } from '@/engine/plan/runPlan';
import { createEngineHandler } from './createEngineHandler';
import type { EngineResponse } from './engineMessages';

declare const self: DedicatedWorkerGlobalScope;

const handle = createEngineHandler(runPlan, (response: EngineResponse) => self.postMessage(response));
self.onmessage = (event: MessageEvent<unknown>) => void handle(event.data);
