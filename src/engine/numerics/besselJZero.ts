// The s-th positive zero of J0 or J1.
// Method: McMahon's expansion j ~ b - (mu-1)/(8b) - 4(mu-1)(7mu-31)/(3(8b)^3), b = (s + nu/2 - 1/4) pi, mu = 4 nu^2
// (Abramowitz & Stegun, Handbook of Mathematical Functions, Eq. 9.5.12, from memory) as the start,
// refined by Brent's method on a bracket of +-0.2 around it (zeros are ~pi apart; the expansion is within 2e-3
// for s = 1 and far closer beyond). Expected error: a few ulp of the zero.
import { besselJ0 } from './besselJ0';
import { besselJ1 } from './besselJ1';
import { findRootBracketed } from './findRootBracketed';

const BRACKET_HALF_WIDTH = 0.2;

export function besselJZero(order: 0 | 1, s: number): number {
  const f = order === 0 ? besselJ0 : besselJ1;
  const mu = 4 * order * order;
  const b = (s + order / 2 - 0.25) * Math.PI;
  const eightB = 8 * b;
  const estimate = b - (mu - 1) / eightB - (4 * (mu - 1) * (7 * mu - 31)) / (3 * eightB ** 3);
  return findRootBracketed(f, estimate - BRACKET_HALF_WIDTH, estimate + BRACKET_HALF_WIDTH);
}
