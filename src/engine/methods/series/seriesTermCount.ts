// How many terms the exact series needs at Fourier number Fo so that the dropped tail is below a tolerance.
// Rule: lambda_n > (n - 1) pi for all three shapes (the brackets in eigenvalues.ts), |X| <= 1 and |mean X| <= 1, and
// a coefficient bound |b_n| <= B max(1, lambda_n) (B = 2 x the largest start excess covers uniform starts and any
// bounded start projected on the sphere, whose coefficients may grow like lambda_n). Then the tail after N terms is
//   sum_{m >= N} B (m + 1) pi exp(-m^2 pi^2 Fo) <= B (N + 1) pi exp(-N^2 pi^2 Fo) / (1 - r),
//   r = (N + 2)/(N + 1) exp(-(2N + 1) pi^2 Fo), a geometric bound (successive terms shrink at least by r for m >= N).
// The count is capped at MAX_SERIES_TERMS: below FoFloor = seriesFourierFloor(B, tol) the series cannot be used.

export const MAX_SERIES_TERMS = 5000;
const PI2 = Math.PI * Math.PI;

function tailBound(n: number, fo: number, amplitudeBoundK: number): number {
  const ratio = ((n + 2) / (n + 1)) * Math.exp(-(2 * n + 1) * PI2 * fo);
  if (ratio >= 1) return Infinity;
  return (amplitudeBoundK * (n + 1) * Math.PI * Math.exp(-n * n * PI2 * fo)) / (1 - ratio);
}

/** Terms needed at fo > 0 for a tail below toleranceK, or Infinity when more than MAX_SERIES_TERMS would be needed. */
export function seriesTermCount(fo: number, amplitudeBoundK: number, toleranceK: number): number {
  if (amplitudeBoundK <= toleranceK) return 1;
  let n = Math.max(1, Math.floor(Math.sqrt(Math.log(amplitudeBoundK / toleranceK) / (PI2 * fo))));
  while (n <= MAX_SERIES_TERMS && tailBound(n, fo, amplitudeBoundK) > toleranceK) n++;
  return n > MAX_SERIES_TERMS ? Infinity : n;
}

/** The smallest Fo at which MAX_SERIES_TERMS terms meet the tolerance (bisection on log Fo; the bound falls with Fo). */
export function seriesFourierFloor(amplitudeBoundK: number, toleranceK: number): number {
  let lo = 1e-14;
  let hi = 1;
  for (let i = 0; i < 60; i++) {
    const mid = Math.sqrt(lo * hi);
    if (tailBound(MAX_SERIES_TERMS, mid, amplitudeBoundK) > toleranceK) lo = mid;
    else hi = mid;
  }
  return hi;
}
