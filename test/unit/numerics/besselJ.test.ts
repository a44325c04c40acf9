import { describe, expect, it } from 'vitest';
import { besselj } from 'bessel';
import { besselJ0 } from '@/engine/numerics/besselJ0';
import { besselJ1 } from '@/engine/numerics/besselJ1';

// The npm `bessel` package (SheetJS 1.0.2) uses the rational approximations of Press et al., Numerical Recipes,
// 2nd ed., Sec. 6.5, good to about 1e-8 absolute (its 2/pi and pi/4 are rounded to 9-10 digits), so it can only
// check us to that level.
const BESSEL_PACKAGE_TOLERANCE = 2e-8;
// The tight reference: Bessel's integral J_n(x) = (1/2pi) int_0^2pi cos(n t - x sin t) dt (Abramowitz & Stegun,
// Handbook of Mathematical Functions, Eq. 9.1.21, from memory) by the trapezoidal rule, which converges
// exponentially for periodic analytic integrands (Trefethen & Weideman, SIAM Review 56 (2014) 385-458).
// Its own rounding is about 1e-16 * x per node, hence the x-dependent tolerance relative to the envelope.
const INTEGRAL_TOLERANCE_RELATIVE_TO_ENVELOPE = 5e-14;

function besselIntegral(order: number, x: number): number {
  const nodes = 2 * Math.ceil(0.75 * Math.abs(x)) + 80;
  let sum = 0;
  for (let i = 0; i < nodes; i++) {
    const t = (2 * Math.PI * i) / nodes;
    sum += Math.cos(order * t - x * Math.sin(t));
  }
  return sum / nodes;
}

const functions = [
  { order: 0, name: 'J0', f: besselJ0 },
  { order: 1, name: 'J1', f: besselJ1 },
] as const;

describe('Bessel J0, J1', () => {
  it('agree with the npm bessel package over 0..100 (its own accuracy ~1e-8)', () => {
    for (const { order, name, f } of functions) {
      for (let x = 0; x <= 100; x += 0.05) {
        const got = f(x);
        const expected = besselj(x, order);
        expect(Math.abs(got - expected), `${name}(${x}): got ${got}, bessel pkg ${expected}, tol ${BESSEL_PACKAGE_TOLERANCE}`).toBeLessThan(BESSEL_PACKAGE_TOLERANCE);
      }
    }
  });

  it('agree with Bessel\'s integral to ~1e-14 of the envelope, across the series, table and asymptotic ranges and large x', () => {
    const xs: number[] = [];
    for (let x = 0; x < 60; x += 0.0371) xs.push(x);
    // Method seams: series/table at 2, table/asymptotic at 25, and the half-way points between table nodes (step 1/32).
    xs.push(1.9999999, 2, 2 + 1 / 64, 10 + 1 / 64 - 1e-12, 10 + 1 / 64 + 1e-12, 24.9999999, 25, 100.5, 1234.5678, 9999.7);
    for (const { order, name, f } of functions) {
      for (const x of xs) {
        const envelope = Math.min(1, Math.sqrt(2 / (Math.PI * Math.max(x, 1e-300))));
        const got = f(x);
        const expected = besselIntegral(order, x);
        const tolerance = INTEGRAL_TOLERANCE_RELATIVE_TO_ENVELOPE * envelope * Math.max(1, x / 25);
        expect(Math.abs(got - expected), `${name}(${x}): got ${got}, integral ${expected}, tol ${tolerance}`).toBeLessThan(tolerance);
      }
    }
  });

  it('match tabulated values (Abramowitz & Stegun, Table 9.1, 10 decimals, from memory)', () => {
    const TABLE_TOLERANCE = 1e-10;
    const rows: [number, number, number][] = [
      [1, 0.7651976866, 0.4400505857],
      [2, 0.2238907791, 0.5767248078],
      [5, -0.1775967713, -0.3275791376],
      [10, -0.2459357645, 0.0434727462],
    ];
    for (const [x, j0, j1] of rows) {
      expect(Math.abs(besselJ0(x) - j0), `J0(${x}) got ${besselJ0(x)} table ${j0}`).toBeLessThan(TABLE_TOLERANCE);
      expect(Math.abs(besselJ1(x) - j1), `J1(${x}) got ${besselJ1(x)} table ${j1}`).toBeLessThan(TABLE_TOLERANCE);
    }
  });

  it('vanish at the tabulated zeros (Abramowitz & Stegun, Table 9.5, from memory) and keep parity', () => {
    const ZERO_TOLERANCE = 1e-15;
    for (const z of [2.404825557695773, 5.520078110286311, 8.653727912911013]) expect(Math.abs(besselJ0(z)), `J0(${z})`).toBeLessThan(ZERO_TOLERANCE);
    for (const z of [3.831705970207512, 7.015586669815619]) expect(Math.abs(besselJ1(z)), `J1(${z})`).toBeLessThan(ZERO_TOLERANCE);
    expect(besselJ0(-3.3)).toBe(besselJ0(3.3));
    expect(besselJ1(-3.3)).toBe(-besselJ1(3.3));
    expect(besselJ0(0)).toBe(1);
    expect(besselJ1(0)).toBe(0);
  });
});
