// Measures read off a stage's sampled curves: the quantities quench cracking and distortion
// are judged by. They are as fine as the sampling: the exact model's surface rate is unbounded at t = 0+.
import type { StageSamples } from '../methods/stageProblem';
import type { PointId } from '@/schema/planSchema';

/** Points on the cooled surface, by shape family; 'surface' for 1-D shapes. */
export const SURFACE_POINTS: PointId[] = ['surface', 'face-x', 'face-y', 'face-z', 'edge', 'corner'];

export interface CurveMeasures {
  maxSurfaceCoolingRateKPerS: number;
  maxCentreSurfaceDifferenceK: number;
  /** Largest difference between any two reported points (mean excluded). */
  maxPointSpreadK: number;
  surfaceRangeK: { lowK: number; highK: number };
}

export function curveMeasures(samples: StageSamples): CurveMeasures {
  const t = samples.timeS;
  const entries = Object.entries(samples.temperaturesK).filter(([id]) => id !== 'mean' && id !== 'depth') as [PointId, Float64Array][];
  const surfaces = entries.filter(([id]) => SURFACE_POINTS.includes(id));
  const centre = samples.temperaturesK.centre;
  let maxRate = 0;
  let maxCentreSurface = 0;
  let maxSpread = 0;
  let low = Infinity;
  let high = -Infinity;
  for (let i = 0; i < t.length; i++) {
    let min = Infinity;
    let max = -Infinity;
    for (const [, c] of entries) {
      min = Math.min(min, c[i]);
      max = Math.max(max, c[i]);
    }
    maxSpread = Math.max(maxSpread, max - min);
    for (const [, s] of surfaces) {
      low = Math.min(low, s[i]);
      high = Math.max(high, s[i]);
      if (centre) maxCentreSurface = Math.max(maxCentreSurface, Math.abs(centre[i] - s[i]));
      // Backward difference between samples.
      if (i > 0 && t[i] > t[i - 1]) maxRate = Math.max(maxRate, (s[i - 1] - s[i]) / (t[i] - t[i - 1]));
    }
  }
  return { maxSurfaceCoolingRateKPerS: maxRate, maxCentreSurfaceDifferenceK: maxCentreSurface, maxPointSpreadK: maxSpread, surfaceRangeK: { lowK: low, highK: high } };
}

/** Largest |a - b| over the points and times both sample sets share (same times by contract). */
export function maxSampleDifference(a: StageSamples, b: StageSamples): number {
  let d = 0;
  for (const [id, ca] of Object.entries(a.temperaturesK) as [PointId, Float64Array][]) {
    const cb = b.temperaturesK[id];
    if (!cb) continue;
    const n = Math.min(ca.length, cb.length);
    for (let i = 0; i < n; i++) d = Math.max(d, Math.abs(ca[i] - cb[i]));
  }
  return d;
}
