// A stage's end-condition target as the charts draw it: the point, its temperature (K) and the stage.
// Built from the plan (planChartTargets) because the result does not repeat the plan's end conditions.
import type { PointId } from '@/schema/planSchema';

export interface ChartTarget {
  stageIndex: number;
  point: PointId;
  /** For point = 'depth': depth below the cooled surface, m. */
  depthM?: number;
  temperatureK: number;
}

/** A further curve drawn over the plan's (e.g. a plan variant), temperatures in K, times from the plan start. */
export interface ExtraSeries {
  name: string;
  timeS: readonly number[];
  temperatureK: readonly number[];
}
