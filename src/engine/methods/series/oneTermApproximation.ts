// The one-term approximation (the hand method): keep only n = 1 of the uniform-start series,
//   theta ~ C1 exp(-lambda1^2 Fo) X(lambda1 x*),  mean theta ~ C1 exp(-lambda1^2 Fo) mean(X_1)
// (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eqs. 5.40-5.52; Cengel & Ghajar, Heat and Mass
// Transfer, Ch. 4, from memory). Within about 2% at the centre for Fo > 0.2 (common practice); error reported by the
// stage solver against the exact series.
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { eigenfunction, eigenfunctionMean, uniformStartCoefficient } from './eigenfunction';
import { eigenvalues } from './eigenvalues';

/** Fo above which the hand method is customarily used (common practice). */
export const ONE_TERM_FROM_FO = 0.2;

export function oneTermTheta(geometry: SeriesGeometry, bi: number, xStar: number, fo: number): number {
  const lambda = eigenvalues(geometry, bi, 1)[0];
  return uniformStartCoefficient(geometry, lambda) * Math.exp(-lambda * lambda * fo) * eigenfunction(geometry, lambda * xStar);
}

export function oneTermMeanTheta(geometry: SeriesGeometry, bi: number, fo: number): number {
  const lambda = eigenvalues(geometry, bi, 1)[0];
  return uniformStartCoefficient(geometry, lambda) * Math.exp(-lambda * lambda * fo) * eigenfunctionMean(geometry, lambda);
}
