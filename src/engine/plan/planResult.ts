// What running a plan returns: the one result type the UI, the worker and the command read.
import type { MethodId } from '../methods/stageProblem';
import type { EngineWarning } from '../validity/warning';
import type { PointId } from '@/schema/planSchema';
import type { Geometry } from '../geometry/geometry';

export interface MethodVerdict {
  method: MethodId;
  valid: boolean;
  /** Why it is or is not valid here, with the numbers. */
  reason: string;
}

export interface BiotNumbers {
  /** Bi on Lc = V/As: the lumped-capacitance check. */
  lumped: { value: number; lengthM: number; lengthLabel: string };
  /** Bi on the series length (L or r0). */
  series: { value: number; lengthM: number; lengthLabel: string };
  /** h used for both (W/m²K): the constant h, or the largest of h(Ts) plus linearised radiation over the stage. */
  hWPerM2K: number;
  conductivityWPerMK: number;
}

export type PointTemperatures = Partial<Record<PointId, number>>;

export interface StageResult {
  index: number;
  name: string;
  method: MethodId;
  forced: boolean;
  methodReason: string;
  verdicts: MethodVerdict[];
  biot: BiotNumbers;
  /** Fo = alpha t / (series length)² at the end of the stage. */
  fourierEnd: number;
  startTimeS: number;
  durationS: number;
  startK: PointTemperatures;
  endK: PointTemperatures;
  heatRemovedJ: number;
  heatBasis: Geometry['basis'];
  /** The one-term approximation against the exact series, where the series was used. */
  oneTermErrorK: { centre: number; surface: number; mean: number; fromFo: number } | null;
  /** The second computation of the stage: its method (refined = the same method re-run at a tenth of the tolerance) and the largest difference. */
  crossCheck: { method: MethodId; refined: boolean; maxDifferenceK: number; toleranceK: number } | null;
  energyRelativeError: number | null;
  /** Largest cooling rate at the surface over the stage, K/s (positive when cooling). */
  maxSurfaceCoolingRateKPerS: number;
  /** Largest |centre - surface| over the stage, K (for finite shapes: against any surface point). */
  maxCentreSurfaceDifferenceK: number;
  /** Largest difference between any two reported points (mean excluded) over the stage, K: a distortion and cracking indicator. */
  maxPointSpreadK: number;
  effort: { steps?: number; cells?: number; terms?: number };
  warnings: EngineWarning[];
  /** Sampled curves; timeS from the start of the plan. */
  curves: { timeS: number[]; temperaturesK: PointTemperaturesSeries };
  /** Temperature against depth at the end of the stage (x from the centre). */
  endProfile: { positionM: number[]; temperatureK: number[] };
}

export type PointTemperaturesSeries = Partial<Record<PointId, number[]>>;

export interface FailedStage {
  index: number;
  name: string;
  code: string;
  message: string;
}

export interface PlanResult {
  planName: string;
  geometry: { volumeM3: number; cooledAreaM2: number; characteristicLengthM: number; seriesLengthM: number; basis: Geometry['basis'] };
  points: { id: PointId; label: string }[];
  stages: StageResult[];
  /** The stage that could not be computed, if any; stages after it are not run. */
  failure: FailedStage | null;
  totalDurationS: number;
  /** False for a quick pass that skipped the second-method check of each stage (crossCheck null per stage). */
  crossChecked: boolean;
  /** The tolerance the stages were solved to, K. */
  toleranceK: number;
  warnings: EngineWarning[];
}
