// The surface temperature at which the boundary takes no heat: fluxOut(T) = 0. With convection alone it is the
// medium temperature; with radiation to surroundings at another temperature it lies between the two.
// Found by bisection, Burden and Faires, Numerical Analysis, 9th ed., Sec. 2.1 (from memory); 200 halvings
// reach machine precision on any bracket.
import type { SurfaceBoundary } from '../../properties/surfaceBoundary';

const BISECTION_STEPS = 200;

export function equilibriumTemperature(boundary: SurfaceBoundary): number {
  const mediumK = boundary.mediumK;
  const surroundingsK = boundary.radiation ? boundary.radiation.surroundingsK : mediumK;
  let lo = Math.min(mediumK, surroundingsK);
  let hi = Math.max(mediumK, surroundingsK);
  if (hi === lo) return lo;
  // fluxOut <= 0 at the colder end and >= 0 at the hotter end: both terms change sign inside the bracket.
  for (let i = 0; i < BISECTION_STEPS && hi - lo > 1e-12 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (boundary.fluxOut(mid) > 0) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}
