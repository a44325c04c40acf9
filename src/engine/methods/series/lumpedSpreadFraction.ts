// How far from one temperature the part really is: the exact centre-to-surface spread over the start excess,
//   (T_centre - T_surface) / (T_i - T_inf) = sum C_n (1 - X_n(1)) exp(-lambda_n^2 Fo)
// for a uniform start (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eqs. 5.39-5.50, from memory).
// The lumped method assumes it is zero; this is its error scale. Bi on the series length (L or r0), not on V/As.
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { uniformStartTheta } from './uniformStartSolution';

const LOG_FO_FROM = -5;
const LOG_FO_TO = 2;
const SCAN_POINTS = 141;
const GOLDEN_ITERATIONS = 60;
const INV_GOLDEN = (Math.sqrt(5) - 1) / 2;

/** Exact (theta_centre - theta_surface) at Fo > 0 for a uniform start. */
export function lumpedSpreadFraction(geometry: SeriesGeometry, biSeries: number, fo: number): number {
  return uniformStartTheta(geometry, biSeries, 0, fo) - uniformStartTheta(geometry, biSeries, 1, fo);
}

/**
 * Largest spread over the whole cooling and the Fo where it occurs: scan of log10 Fo in [-5, 2], then golden-section
 * refinement around the best point (Kiefer 1953; Press et al., Numerical Recipes, 3rd ed., Sec. 10.2, from memory).
 */
export function largestLumpedSpreadFraction(geometry: SeriesGeometry, biSeries: number): { fraction: number; fo: number } {
  const at = (logFo: number) => lumpedSpreadFraction(geometry, biSeries, 10 ** logFo);
  const step = (LOG_FO_TO - LOG_FO_FROM) / (SCAN_POINTS - 1);
  let best = 0;
  let bestValue = -Infinity;
  for (let i = 0; i < SCAN_POINTS; i++) {
    const v = at(LOG_FO_FROM + i * step);
    if (v > bestValue) { bestValue = v; best = i; }
  }
  let a = LOG_FO_FROM + Math.max(0, best - 1) * step;
  let b = LOG_FO_FROM + Math.min(SCAN_POINTS - 1, best + 1) * step;
  let c = b - INV_GOLDEN * (b - a);
  let d = a + INV_GOLDEN * (b - a);
  let fc = at(c);
  let fd = at(d);
  for (let i = 0; i < GOLDEN_ITERATIONS; i++) {
    if (fc > fd) { b = d; d = c; fd = fc; c = b - INV_GOLDEN * (b - a); fc = at(c); }
    else { a = c; c = d; fc = fd; d = a + INV_GOLDEN * (b - a); fd = at(d); }
  }
  const logFo = 0.5 * (a + b);
  return { fraction: Math.max(at(logFo), bestValue), fo: 10 ** logFo };
}
