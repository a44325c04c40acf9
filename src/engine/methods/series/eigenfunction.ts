// The 1-D eigenfunctions of the three shapes and their weighted integrals, in the dimensionless position
// x* = x / L in [0, 1] with weight x*^d (d = 0 slab, 1 cylinder, 2 sphere):
//   X(z) = cos z (slab), J0(z) (cylinder), sin z / z (sphere)
// (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eqs. 5.39a, 5.49a, 5.50a, from memory).
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { besselJ0 } from '@/engine/numerics/besselJ0';
import { besselJ1 } from '@/engine/numerics/besselJ1';
import { sinMinusXCos } from '@/engine/numerics/sinMinusXCos';
import { twoXMinusSinTwoX } from '@/engine/numerics/twoXMinusSinTwoX';

/** Power d of the volume weight x*^d. */
export function weightPower(geometry: SeriesGeometry): 0 | 1 | 2 {
  return geometry === 'slab' ? 0 : geometry === 'cylinder' ? 1 : 2;
}

export function eigenfunction(geometry: SeriesGeometry, z: number): number {
  if (geometry === 'slab') return Math.cos(z);
  if (geometry === 'cylinder') return besselJ0(z);
  return z === 0 ? 1 : Math.sin(z) / z;
}

/**
 * Norm int_0^1 X(lambda x)^2 x^d dx in closed form:
 *   slab (2 lambda + sin 2 lambda) / (4 lambda); cylinder (J0^2 + J1^2) / 2 (Lommel's integral, Watson, A Treatise
 *   on the Theory of Bessel Functions, 2nd ed., Sec. 5.11, from memory); sphere (2 lambda - sin 2 lambda) / (4 lambda^3).
 */
export function eigenfunctionNorm(geometry: SeriesGeometry, lambda: number): number {
  if (geometry === 'slab') return (2 * lambda + Math.sin(2 * lambda)) / (4 * lambda);
  if (geometry === 'cylinder') {
    const j0 = besselJ0(lambda);
    const j1 = besselJ1(lambda);
    return 0.5 * (j0 * j0 + j1 * j1);
  }
  return twoXMinusSinTwoX(lambda) / (4 * lambda ** 3);
}

/**
 * Volume mean of X(lambda x*): (d + 1) int_0^1 X x^d dx =
 *   sin lambda / lambda (slab), 2 J1(lambda) / lambda (cylinder), 3 (sin lambda - lambda cos lambda) / lambda^3 (sphere)
 * (Incropera et al., 6th ed., Eqs. 5.46, 5.51, 5.52 for Q/Q0, from memory).
 */
export function eigenfunctionMean(geometry: SeriesGeometry, lambda: number): number {
  if (geometry === 'slab') return Math.sin(lambda) / lambda;
  if (geometry === 'cylinder') return (2 * besselJ1(lambda)) / lambda;
  return (3 * sinMinusXCos(lambda)) / lambda ** 3;
}

/**
 * Coefficient of a uniform start, C_n = int X x^d / norm:
 *   slab 4 sin lambda / (2 lambda + sin 2 lambda); cylinder (2 / lambda) J1 / (J0^2 + J1^2);
 *   sphere 4 (sin lambda - lambda cos lambda) / (2 lambda - sin 2 lambda)
 * (Incropera et al., 6th ed., Eqs. 5.39b, 5.49b, 5.50b, from memory).
 */
export function uniformStartCoefficient(geometry: SeriesGeometry, lambda: number): number {
  if (geometry === 'slab') return (4 * Math.sin(lambda)) / (2 * lambda + Math.sin(2 * lambda));
  if (geometry === 'cylinder') {
    const j0 = besselJ0(lambda);
    const j1 = besselJ1(lambda);
    return (2 / lambda) * (j1 / (j0 * j0 + j1 * j1));
  }
  return (4 * sinMinusXCos(lambda)) / twoXMinusSinTwoX(lambda);
}
