// The time axis a plan reads best on: log when some stage is a sliver of the whole (a 15 s transfer before a
// 50 min hold), linear otherwise. A display choice only; the user can switch.
import type { PlanResult } from '@/engine/plan/planResult';
import type { TimeAxisKind } from './temperatureHistoryFigure';

/** A stage shorter than this share of the plan is hard to read on a linear axis. */
const SLIVER_SHARE = 0.05;

export function suggestedTimeAxis(result: PlanResult): TimeAxisKind {
  if (result.stages.length < 2 || result.totalDurationS <= 0) return 'linear';
  const shortestS = Math.min(...result.stages.map((s) => s.durationS));
  return shortestS < SLIVER_SHARE * result.totalDurationS ? 'log' : 'linear';
}
