// What the engine worker last returned, and how the current computation is going.
import type { StateCreator } from 'zustand/vanilla';
import type { PlanResult } from '@/engine/plan/planResult';
import type { EngineStatus, ResultInfo } from '@/worker/createEngineClient';
import type { PlanRunResult } from '@/worker/engineMessages';
import type { AppState } from './appState';

export interface ResultsSlice {
  engineStatus: EngineStatus;
  engineMessage: string | null;
  /** 0..1 while a run reports progress, else null. */
  progress: number | null;
  /** Results by plan id ('main' and variant ids). */
  results: Record<string, PlanResult>;
  /** Run whose results are shown, and the latest run asked for: they differ while results are out of date. */
  shownRunId: number | null;
  requestedRunId: number | null;
  lastRunMs: number | null;
  /** False while the shown results are the quick pass, before every stage has been cross-checked. */
  resultsComplete: boolean;
  runRequested(runId: number): void;
  receiveResults(results: PlanRunResult[], info: ResultInfo): void;
  setEngineStatus(status: EngineStatus, message?: string): void;
  setProgress(fraction: number): void;
}

export const createResultsSlice: StateCreator<AppState, [], [], ResultsSlice> = (set) => ({
  engineStatus: 'idle',
  engineMessage: null,
  progress: null,
  results: {},
  shownRunId: null,
  requestedRunId: null,
  lastRunMs: null,
  resultsComplete: false,
  runRequested(runId) {
    set({ requestedRunId: runId });
  },
  receiveResults(list, { runId, elapsedMs, complete }) {
    set({ results: Object.fromEntries(list.map((r) => [r.id, r.result])), shownRunId: runId, lastRunMs: elapsedMs, resultsComplete: complete, ...(complete ? { progress: null } : {}) });
  },
  setEngineStatus(status, message) {
    set({ engineStatus: status, engineMessage: message ?? null, ...(status === 'running' ? {} : { progress: null }) });
  },
  setProgress(fraction) {
    set({ progress: fraction });
  },
});
