// The end-condition targets of a plan (kelvin plan), for the temperature chart.
import type { PlanK } from '@/schema/planSchema';
import type { ChartTarget } from './chartTarget';

export function planChartTargets(plan: PlanK): ChartTarget[] {
  return plan.stages.flatMap((stage, stageIndex): ChartTarget[] =>
    stage.end.kind === 'point-temperature'
      ? [{ stageIndex, point: stage.end.point, temperatureK: stage.end.temperature, ...(stage.end.depthM === undefined ? {} : { depthM: stage.end.depthM }) }]
      : [],
  );
}
