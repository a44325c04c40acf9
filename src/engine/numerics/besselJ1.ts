// Bessel function of the first kind of order 1. Method, validity and error: see besselFirstKind.ts.
import { besselFirstKind } from './besselFirstKind';

export function besselJ1(x: number): number {
  return besselFirstKind(1, x);
}
