// The variants' curves to draw over the main plan's chart: one series per variant and overlaid point,
// named "<variant> · <point>", read straight from each variant's result (times from the plan start).
import type { PlanResult } from '@/engine/plan/planResult';
import type { PointId } from '@/schema/planSchema';
import type { ExtraSeries } from '@/features/charts/chartTarget';

/** Distinct dash-and-marker patterns the chart has for extra series (charts/pointTraceStyle.ts EXTRA_STYLES). */
export const DISTINCT_EXTRA_STYLES = 4;

/**
 * Points overlaid per variant: centre and surface while every series still gets a pattern of its own,
 * centre only beyond that, so that variants stay apart by line and marker, not by colour alone.
 */
export function overlaidPoints(variantCount: number): readonly PointId[] {
  return variantCount * 2 <= DISTINCT_EXTRA_STYLES ? ['centre', 'surface'] : ['centre'];
}

export function variantOverlaySeries(variants: { name: string; result: PlanResult | undefined }[], points: readonly PointId[] = overlaidPoints(variants.length)): ExtraSeries[] {
  return variants.flatMap(({ name, result }) => {
    if (!result) return [];
    return points.flatMap((point): ExtraSeries[] => {
      const timeS: number[] = [];
      const temperatureK: number[] = [];
      for (const stage of result.stages) {
        const curve = stage.curves.temperaturesK[point];
        if (!curve) continue;
        timeS.push(...stage.curves.timeS);
        temperatureK.push(...curve);
      }
      if (timeS.length === 0) return [];
      const label = result.points.find((p) => p.id === point)?.label ?? point;
      return [{ name: `${name} · ${label}`, timeS, temperatureK }];
    });
  });
}
