// The classic exact solution for a uniform start in a medium at T_inf with constant h and properties:
//   theta = (T - T_inf)/(T_i - T_inf) = sum C_n exp(-lambda_n^2 Fo) X(lambda_n x*),
//   mean theta = sum C_n exp(-lambda_n^2 Fo) mean(X_n),  Q/Q0 = 1 - mean theta
// (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eqs. 5.39-5.52; Cengel & Ghajar, Heat and Mass
// Transfer, Ch. 4, from memory). Fo = alpha t / L^2 and Bi = h L / k on the series length (L or r0).
// Truncation: seriesTermCount with a tail below THETA_TAIL_TOLERANCE; valid for Fo >= seriesFourierFloor (~1e-7),
// below which a RangeError is thrown (no short-time form is used). At Fo = 0 theta is 1 (the start).
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { eigenfunction, eigenfunctionMean, uniformStartCoefficient } from './eigenfunction';
import { eigenvalues } from './eigenvalues';
import { seriesFourierFloor, seriesTermCount } from './seriesTermCount';
import { seriesSum } from './seriesSum';

const THETA_TAIL_TOLERANCE = 1e-12;
const UNIFORM_COEFFICIENT_BOUND = 2;

function termsAt(fo: number): number {
  const n = seriesTermCount(fo, UNIFORM_COEFFICIENT_BOUND, THETA_TAIL_TOLERANCE);
  if (!Number.isFinite(n)) throw new RangeError(`Fo = ${fo} is below the series floor ${seriesFourierFloor(UNIFORM_COEFFICIENT_BOUND, THETA_TAIL_TOLERANCE).toExponential(2)}`);
  return n;
}

function weighted(geometry: SeriesGeometry, lambdas: Float64Array, at: (lambda: number) => number): Float64Array {
  return Float64Array.from(lambdas, (l) => uniformStartCoefficient(geometry, l) * at(l));
}

/** theta(x*, Fo) for a uniform start; x* = x / L from the centre. */
export function uniformStartTheta(geometry: SeriesGeometry, bi: number, xStar: number, fo: number): number {
  if (fo === 0) return 1;
  const n = termsAt(fo);
  const lambdas = eigenvalues(geometry, bi, n);
  return seriesSum(weighted(geometry, lambdas, (l) => eigenfunction(geometry, l * xStar)), lambdas, fo, n);
}

/** Volume-mean theta at Fo for a uniform start. */
export function uniformStartMeanTheta(geometry: SeriesGeometry, bi: number, fo: number): number {
  if (fo === 0) return 1;
  const n = termsAt(fo);
  const lambdas = eigenvalues(geometry, bi, n);
  return seriesSum(weighted(geometry, lambdas, (l) => eigenfunctionMean(geometry, l)), lambdas, fo, n);
}

/** Q/Q0: heat given up so far over the most that can be given up, rho c V (T_i - T_inf). */
export function uniformStartHeatFraction(geometry: SeriesGeometry, bi: number, fo: number): number {
  return 1 - uniformStartMeanTheta(geometry, bi, fo);
}
