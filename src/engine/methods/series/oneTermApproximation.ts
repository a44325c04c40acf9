// The one-term approximation (the hand method): keep only n = 1 of the uniform-start series,
//   theta ~ C1 exp(-lambda1^2 Fo) X(lambda1 x*),  mean theta ~ C1 exp(-lambda1^2 Fo) mean(X_1)
// (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eqs. 5.40-5.52; Cengel & Ghajar, Heat and Mass
// Transfer, Ch. 4, from memory). Within about 2% at the centre for Fo > 0.2 (common practice); its error is reported
// by the stage solver against the exact series.
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { eigenfunction, eigenfunctionMean, uniformStartCoefficient } from './eigenfunction';
import { eigenvalues } from './eigenvalues';

/** Fo above which the hand method is customarily used (common practice). */
export const ONE_TERM_FROM_FO = 0.2;

export interface OneTermApproximation {
  lambda1: number;
  c1: number;
  theta(xStar: number, fo: number): number;
  meanTheta(fo: number): number;
}

export function oneTermApproximation(geometry: SeriesGeometry, bi: number): OneTermApproximation {
  const lambda1 = eigenvalues(geometry, bi, 1)[0];
  const c1 = uniformStartCoefficient(geometry, lambda1);
  const mean1 = eigenfunctionMean(geometry, lambda1);
  const decay = (fo: number) => c1 * Math.exp(-lambda1 * lambda1 * fo);
  return {
    lambda1,
    c1,
    theta: (xStar, fo) => decay(fo) * eigenfunction(geometry, lambda1 * xStar),
    meanTheta: (fo) => decay(fo) * mean1,
  };
}
