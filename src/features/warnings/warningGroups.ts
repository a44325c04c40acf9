// The result's warnings grouped for the list: the whole plan first, then each stage in order; within a group
// the most serious first. Warnings carried both on the plan and on a stage are listed once.
import type { PlanResult } from '@/engine/plan/planResult';
import type { EngineWarning } from '@/engine/validity/warning';
import { severityMark } from './severityMark';

export interface WarningGroup {
  key: string;
  title: string;
  stageIndex: number | null;
  warnings: EngineWarning[];
}

const identity = (w: EngineWarning) => `${w.stageIndex ?? 'plan'}|${w.ruleId}|${w.message}`;

export function warningGroups(result: PlanResult): WarningGroup[] {
  const seen = new Set<string>();
  const all = [...result.warnings, ...result.stages.flatMap((s) => s.warnings)].filter((w) => {
    const id = identity(w);
    if (seen.has(id)) return false;
    seen.add(id);
    return true;
  });
  const bySeverity = (a: EngineWarning, b: EngineWarning) => severityMark(a.severity).rank - severityMark(b.severity).rank;
  const stageName = (index: number) => result.stages.find((s) => s.index === index)?.name ?? (result.failure?.index === index ? result.failure.name : null);
  const indices = [...new Set(all.map((w) => w.stageIndex))].sort((a, b) => (a === null ? -1 : b === null ? 1 : a - b));
  return indices.map((stageIndex) => {
    const name = stageIndex === null ? null : stageName(stageIndex);
    return {
      key: stageIndex === null ? 'plan' : `stage-${stageIndex}`,
      title: stageIndex === null ? 'Whole plan' : `Stage ${stageIndex + 1}${name ? `: ${name}` : ''}`,
      stageIndex,
      warnings: all.filter((w) => w.stageIndex === stageIndex).sort(bySeverity),
    };
  });
}
