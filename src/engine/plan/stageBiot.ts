// Biot numbers of a stage, both ways: on Lc = V/As (the lumped check) and on the series length.
// Bi = h L / k, Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eq. 5.10 (from memory).
import type { Geometry } from '../geometry/geometry';
import type { SurfaceBoundary } from '../properties/surfaceBoundary';
import { radiationCoefficient } from '../properties/surfaceBoundary';
import type { BiotNumbers } from './planResult';

/** Surface temperatures sampled between the start and the medium to find the largest h(Ts). */
const H_SCAN_POINTS = 64;

/**
 * The h the Biot numbers are built on: the largest convective h(Ts) over the surface range the
 * stage can sweep (from its starting surface temperature to the medium), plus the linearised
 * radiation coefficient at the hotter end. Conservative: the method check must hold everywhere.
 */
export function effectiveH(boundary: SurfaceBoundary, surfaceStartK: number): number {
  const lo = Math.min(surfaceStartK, boundary.mediumK);
  const hi = Math.max(surfaceStartK, boundary.mediumK);
  let h = 0;
  for (let i = 0; i <= H_SCAN_POINTS; i++) h = Math.max(h, boundary.convectionCoefficient(lo + ((hi - lo) * i) / H_SCAN_POINTS));
  const rad = boundary.radiation;
  return rad ? h + radiationCoefficient(rad.emissivity, hi, rad.surroundingsK) : h;
}

export function stageBiot(geometry: Geometry, hWPerM2K: number, conductivityWPerMK: number): BiotNumbers {
  return {
    lumped: { value: (hWPerM2K * geometry.characteristicLengthM) / conductivityWPerMK, lengthM: geometry.characteristicLengthM, lengthLabel: 'Lc = V/As' },
    series: { value: (hWPerM2K * geometry.seriesLengthM) / conductivityWPerMK, lengthM: geometry.seriesLengthM, lengthLabel: geometry.seriesLengthLabel },
    hWPerM2K,
    conductivityWPerMK,
  };
}
