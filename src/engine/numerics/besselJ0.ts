// Bessel function of the first kind of order 0. Method, validity and error: see besselFirstKind.ts.
import { besselFirstKind } from './besselFirstKind';

export function besselJ0(x: number): number {
  return besselFirstKind(0, x);
}
