// Positive eigenvalues lambda_n of the 1-D transient-conduction problem with convection at the surface:
//   slab      lambda tan lambda = Bi             (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eq. 5.39c)
//   cylinder  lambda J1(lambda) / J0(lambda) = Bi (ibid., Eq. 5.49c)
//   sphere    1 - lambda cot lambda = Bi         (ibid., Eq. 5.50c)  (equation numbers from memory)
// Bi = Infinity (fixed surface temperature): (n - 1/2) pi, the zeros of J0, n pi.
// Method: one bracket per root between consecutive singularities/zeros, so no root is skipped or repeated:
//   slab      lambda_n in ((n-1) pi, (n-1/2) pi)       as delta = lambda - (n-1) pi in [0, pi/2] of lambda sin - Bi cos
//   cylinder  lambda_n in (j_{1,n-1}, j_{0,n})          (j_{1,0} = 0) of lambda J1 - Bi J0
//   sphere    lambda_n in ((n-1) pi, n pi)              of (1 - Bi) sin - lambda cos (n = 1: divided by lambda)
// (Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed., Secs. 3.9, 7.7, 9.8, from memory), each solved by Brent.
// Validity: 0 < Bi <= Infinity; tested from 1e-6 to 1e6. Convergence: Brent to a few ulp of lambda.
// Cached per (geometry, Bi); the cache grows as more terms are asked for. Callers must not write into the result.
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { besselJ0 } from '@/engine/numerics/besselJ0';
import { besselJ1 } from '@/engine/numerics/besselJ1';
import { besselJZero } from '@/engine/numerics/besselJZero';
import { findRootBracketed } from '@/engine/numerics/findRootBracketed';
import { sinMinusXCos } from '@/engine/numerics/sinMinusXCos';

const HALF_PI = Math.PI / 2;
const CACHE_LIMIT_ENTRIES = 64;

const cache = new Map<string, Float64Array>();
// Zeros of J0 and J1 do not depend on Bi: shared by every cylinder entry.
const zerosJ0: number[] = [];
const zerosJ1: number[] = [];

function slabRoot(n: number, bi: number): number {
  if (bi === Infinity) return (n - 0.5) * Math.PI;
  const base = (n - 1) * Math.PI;
  // (-1)^(n-1) (lambda sin lambda - Bi cos lambda) written in delta = lambda - base.
  const g = (d: number) => (base + d) * Math.sin(d) - bi * Math.cos(d);
  return base + findRootBracketed(g, 0, HALF_PI, 0, -bi, base + HALF_PI);
}

function cylinderRoot(n: number, bi: number): number {
  while (zerosJ0.length < n) zerosJ0.push(besselJZero(0, zerosJ0.length + 1));
  if (bi === Infinity) return zerosJ0[n - 1];
  while (zerosJ1.length < n - 1) zerosJ1.push(besselJZero(1, zerosJ1.length + 1));
  const lo = n === 1 ? 0 : zerosJ1[n - 2];
  const hi = zerosJ0[n - 1];
  const g = (x: number) => x * besselJ1(x) - bi * besselJ0(x);
  return findRootBracketed(g, lo, hi);
}

function sphereRoot(n: number, bi: number): number {
  if (bi === Infinity) return n * Math.PI;
  if (n === 1) {
    // ((1 - Bi) sin lambda - lambda cos lambda) / lambda = (sin - lambda cos)/lambda - Bi sin/lambda: -Bi at 0, +1 at pi.
    const g = (x: number) => (x === 0 ? -bi : (sinMinusXCos(x) - bi * Math.sin(x)) / x);
    return findRootBracketed(g, 0, Math.PI, 0, -bi, 1);
  }
  const base = (n - 1) * Math.PI;
  const g = (d: number) => (1 - bi) * Math.sin(d) - (base + d) * Math.cos(d);
  return base + findRootBracketed(g, 0, Math.PI, 0, -base, base + Math.PI);
}

/** The first `count` positive eigenvalues for the geometry at Biot number bi (on the series length L or r0). */
export function eigenvalues(geometry: SeriesGeometry, bi: number, count: number): Float64Array {
  if (!(bi > 0)) throw new RangeError(`Biot number must be positive, got ${bi}`);
  const key = `${geometry}:${bi}`;
  const known = cache.get(key);
  if (known && known.length >= count) return known.subarray(0, count);
  const size = Math.max(count, known ? Math.min(2 * known.length, count * 2) : count);
  const roots = new Float64Array(size);
  const start = known ? known.length : 0;
  if (known) roots.set(known);
  for (let i = start; i < size; i++) {
    const n = i + 1;
    roots[i] = geometry === 'slab' ? slabRoot(n, bi) : geometry === 'cylinder' ? cylinderRoot(n, bi) : sphereRoot(n, bi);
  }
  if (!known && cache.size >= CACHE_LIMIT_ENTRIES) cache.delete(cache.keys().next().value as string);
  cache.set(key, roots);
  return roots.subarray(0, count);
}
