// The variants' curves to draw over the main plan's chart: one series per variant and point,
// named "<variant> · <point>", read straight from each variant's result (times from the plan start).
import type { PlanResult } from '@/engine/plan/planResult';
import type { PointId } from '@/schema/planSchema';
import type { ExtraSeries } from '@/features/charts/chartTarget';

/** Points overlaid per variant: enough to compare, few enough to read. */
export const OVERLAID_POINTS: readonly PointId[] = ['centre', 'surface'];

export function variantOverlaySeries(variants: { name: string; result: PlanResult | undefined }[], points: readonly PointId[] = OVERLAID_POINTS): ExtraSeries[] {
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
