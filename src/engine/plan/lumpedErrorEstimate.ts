// The error lumped capacitance makes in a stage: the centre-to-surface spread it ignores.
// Two parts: the spread the stage starts with (lumped assumes it away), and the largest spread the
// exact series develops from a uniform start at this Biot number, scaled by the stage's temperature
// swing. For finite shapes the axes combine as a product: 1 - prod(1 - s_d) (product solutions,
// Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Sec. 5.8, from memory).
import type { Geometry } from '../geometry/geometry';
import type { PointTemperatures } from './planResult';
import { largestLumpedSpreadFraction } from '../methods/series/lumpedSpreadFraction';

export function lumpedErrorEstimateK(geometry: Geometry, hOverKPerM: number, startK: PointTemperatures, mediumK: number): number {
  const pointValues = Object.entries(startK).filter(([id]) => id !== 'mean' && id !== 'depth').map(([, v]) => v as number);
  const startSpreadK = Math.max(...pointValues) - Math.min(...pointValues);
  const axes = geometry.oneD
    ? [{ geometry: geometry.oneD.geometry, lengthM: geometry.oneD.lengthM }]
    : (geometry.finiteAxes ?? []).map((a) => ({ geometry: a.coordinate === 'radial' ? ('cylinder' as const) : ('slab' as const), lengthM: a.halfLengthM }));
  const keep = axes.reduce((p, a) => p * (1 - largestLumpedSpreadFraction(a.geometry, hOverKPerM * a.lengthM).fraction), 1);
  const swingK = Math.abs((startK.mean ?? mediumK) - mediumK);
  return Math.max(startSpreadK, (1 - keep) * swingK);
}
