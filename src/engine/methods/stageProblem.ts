// The contract every solution method fulfils: one stage, from a start field to an end condition.
// The plan runner (plan/runPlan.ts) builds a StageProblem, picks a method, and cross-checks it with another.
import type { Geometry } from '../geometry/geometry';
import type { MaterialModel } from '../properties/materialModel';
import type { SurfaceBoundary } from '../properties/surfaceBoundary';
import type { Field } from '../fields';
import type { PointId } from '@/schema/planSchema';

export type MethodId = 'lumped' | 'series' | 'finite-volume';

/** Where a stage ends, temperatures in kelvin. */
export type StageEnd =
  | { kind: 'duration'; seconds: number }
  | { kind: 'point-temperature'; point: PointId; depthM?: number; temperatureK: number };

export interface StageProblem {
  geometry: Geometry;
  material: MaterialModel;
  boundary: SurfaceBoundary;
  start: Field;
  end: StageEnd;
  /** Reported temperatures must be within this many kelvin of the exact answer. Default 0.01 K. */
  toleranceK: number;
  /** Curves are sampled at this many times, evenly spaced over [0, duration], ends included. */
  sampleCount: number;
  /** Extra point reported as 'depth' (below the cooled surface), when the plan asks for one. */
  depthM?: number;
  /**
   * For methods that need constant properties (lumped, series): the temperature at which to
   * evaluate them. The runner sets it; methods never choose it.
   */
  propertyTemperatureK: number;
  signal?: AbortSignal;
}

export interface StageSamples {
  /** Seconds from the start of the stage. */
  timeS: Float64Array;
  /** One curve per reported point of the geometry ('centre', 'surface', 'mean', and 'depth' when asked). */
  temperaturesK: Partial<Record<PointId, Float64Array>>;
}

export interface StageSolution {
  method: MethodId;
  durationS: number;
  samples: StageSamples;
  endField: Field;
  /** Heat given up by the part over the stage, J, on the geometry's basis (per part, per m², per m). */
  heatRemovedJ: number;
  /** |heat through the surface - change of stored energy| / |change of stored energy|, where the method computes both. */
  energyRelativeError: number | null;
  /** Time steps taken (numerical methods), or series terms used (series). */
  effort: { steps?: number; cells?: number; terms?: number };
  /** Extra facts a method reports, e.g. the one-term approximation's error. */
  notes: StageNote[];
}

export interface StageNote {
  kind: 'one-term-error';
  /** Largest |one-term - exact| over the stage at centre, surface and mean, K, where Fo > 0.2 ... see series docs. */
  centreK: number;
  surfaceK: number;
  meanK: number;
  /** Fo from which the one-term values were compared. */
  fromFo: number;
}

export type StageOutcome =
  | { ok: true; solution: StageSolution }
  | { ok: false; code: 'target-unreachable' | 'target-not-reached' | 'not-applicable' | 'aborted'; message: string };

export type StageSolver = (problem: StageProblem) => StageOutcome;
