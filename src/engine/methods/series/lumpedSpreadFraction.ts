// How far from one temperature the part really is: the exact centre-to-surface spread over the start excess,
//   (T_centre - T_surface) / (T_i - T_inf) = sum C_n (1 - X_n(1)) exp(-lambda_n^2 Fo)
// for a uniform start (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eqs. 5.39-5.50, from memory).
// The lumped method assumes it is zero; this is its error scale. Bi on the series length (L or r0), not on V/As.
// Truncation as in uniformStartSolution (tail below 1e-12); valid for Fo >= 1e-5 (the scan's lower end).
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { eigenfunction, uniformStartCoefficient } from './eigenfunction';
import { eigenvalues } from './eigenvalues';
import { seriesTermCount } from './seriesTermCount';
import { seriesSum } from './seriesSum';

const THETA_TAIL_TOLERANCE = 1e-12;
const UNIFORM_COEFFICIENT_BOUND = 2;
const LOG_FO_FROM = -5;
const LOG_FO_TO = 2;
const SCAN_POINTS = 141;
const GOLDEN_ITERATIONS = 60;
const INV_GOLDEN = (Math.sqrt(5) - 1) / 2;

/** The spread as a function of Fo >= foFrom, with the terms computed once. */
function spreadCurve(geometry: SeriesGeometry, biSeries: number, foFrom: number): (fo: number) => number {
  const most = seriesTermCount(foFrom, UNIFORM_COEFFICIENT_BOUND, THETA_TAIL_TOLERANCE);
  if (!Number.isFinite(most)) throw new RangeError(`Fo = ${foFrom} is below the series floor`);
  const lambdas = eigenvalues(geometry, biSeries, most);
  const weights = Float64Array.from(lambdas, (l) => uniformStartCoefficient(geometry, l) * (1 - eigenfunction(geometry, l)));
  return (fo) => seriesSum(weights, lambdas, fo, Math.min(most, seriesTermCount(fo, UNIFORM_COEFFICIENT_BOUND, THETA_TAIL_TOLERANCE)));
}

/** Exact (theta_centre - theta_surface) at Fo >= 1e-5 for a uniform start. */
export function lumpedSpreadFraction(geometry: SeriesGeometry, biSeries: number, fo: number): number {
  return spreadCurve(geometry, biSeries, fo)(fo);
}

/**
 * Largest spread over the whole cooling and the Fo where it occurs: scan of log10 Fo in [-5, 2], then golden-section
 * refinement around the best point (Kiefer 1953; Press et al., Numerical Recipes, 3rd ed., Sec. 10.2, from memory).
 */
export function largestLumpedSpreadFraction(geometry: SeriesGeometry, biSeries: number): { fraction: number; fo: number } {
  const curve = spreadCurve(geometry, biSeries, 10 ** LOG_FO_FROM);
  const at = (logFo: number) => curve(10 ** logFo);
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
  const refined = at(logFo);
  return refined >= bestValue ? { fraction: refined, fo: 10 ** logFo } : { fraction: bestValue, fo: 10 ** (LOG_FO_FROM + best * step) };
}
