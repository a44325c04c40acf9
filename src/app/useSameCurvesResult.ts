// The full (cross-checked) pass repeats the quick pass's curves; handing the charts the earlier
// result object when every curve is the same saves a second redraw of each chart per edit.
import { useRef } from 'react';
import type { PlanResult } from '@/engine/plan/planResult';

function sameNumbers(a: readonly number[] | undefined, b: readonly number[] | undefined): boolean {
  if (a === b) return true;
  if (!a || !b || a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** True when two results would draw the same charts: same points, stages, curves and end profiles. */
export function drawsTheSame(a: PlanResult, b: PlanResult): boolean {
  if (a.planName !== b.planName || a.stages.length !== b.stages.length || a.points.length !== b.points.length) return false;
  if (a.points.some((p, i) => p.id !== b.points[i].id || p.label !== b.points[i].label)) return false;
  return a.stages.every((s, i) => {
    const t = b.stages[i];
    if (s.name !== t.name || s.startTimeS !== t.startTimeS || s.durationS !== t.durationS || !sameNumbers(s.curves.timeS, t.curves.timeS)) return false;
    const keys = Object.keys(s.curves.temperaturesK) as (keyof typeof s.curves.temperaturesK)[];
    if (keys.length !== Object.keys(t.curves.temperaturesK).length) return false;
    return (
      keys.every((k) => sameNumbers(s.curves.temperaturesK[k], t.curves.temperaturesK[k])) &&
      sameNumbers(s.endProfile.positionM, t.endProfile.positionM) &&
      sameNumbers(s.endProfile.temperatureK, t.endProfile.temperatureK)
    );
  });
}

export function useSameCurvesResult(result: PlanResult | null): PlanResult | null {
  const shown = useRef<PlanResult | null>(null);
  if (result === null || shown.current === null || !drawsTheSame(shown.current, result)) shown.current = result;
  return shown.current;
}
