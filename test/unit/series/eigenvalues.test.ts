import { describe, expect, it } from 'vitest';
import table from '../../fixtures/incropera-table-5-1/one-term-coefficients.json';
import { eigenvalues } from '@/engine/methods/series/eigenvalues';
import { uniformStartCoefficient } from '@/engine/methods/series/eigenfunction';
import { besselJ0 } from '@/engine/numerics/besselJ0';
import { besselJ1 } from '@/engine/numerics/besselJ1';
import type { SeriesGeometry } from '@/engine/geometry/geometry';

// The table is printed to 4 decimals: half a unit of the last place, plus a hair for the rounding of our value.
const FOUR_DECIMALS_TOLERANCE = 0.5e-4 + 1e-9;
const GEOMETRIES: SeriesGeometry[] = ['slab', 'cylinder', 'sphere'];

function residual(geometry: SeriesGeometry, bi: number, lambda: number): number {
  // The characteristic equation multiplied out so that it is bounded: slab lambda sin - Bi cos,
  // cylinder lambda J1 - Bi J0, sphere (1 - Bi) sin - lambda cos; scaled by the size of its terms.
  if (geometry === 'slab') return (lambda * Math.sin(lambda) - bi * Math.cos(lambda)) / (lambda + bi);
  if (geometry === 'cylinder') return (lambda * besselJ1(lambda) - bi * besselJ0(lambda)) / ((lambda + bi) * Math.sqrt(2 / (Math.PI * Math.max(lambda, 1))));
  return ((1 - bi) * Math.sin(lambda) - lambda * Math.cos(lambda)) / (lambda + Math.abs(1 - bi));
}

describe('eigenvalues of the 1-D series', () => {
  for (const geometry of GEOMETRIES) {
    it(`${geometry}: lambda1 and C1 match Incropera 6th ed. Table 5.1 (from memory)`, () => {
      for (const [bi, lambda1, c1] of table.rows[geometry]) {
        const got = eigenvalues(geometry, bi, 1)[0];
        const c = uniformStartCoefficient(geometry, got);
        expect(Math.abs(got - lambda1), `${geometry} Bi=${bi}: lambda1 got ${got}, table ${lambda1}, tol ${FOUR_DECIMALS_TOLERANCE}`).toBeLessThan(FOUR_DECIMALS_TOLERANCE);
        expect(Math.abs(c - c1), `${geometry} Bi=${bi}: C1 got ${c}, table ${c1}, tol ${FOUR_DECIMALS_TOLERANCE}`).toBeLessThan(FOUR_DECIMALS_TOLERANCE);
      }
    });
  }

  it('Bi = Infinity gives (n - 1/2) pi, the zeros of J0 (A&S Table 9.5, from memory) and n pi', () => {
    const EXACT_TOLERANCE = 1e-15;
    const slab = eigenvalues('slab', Infinity, 3);
    const cyl = eigenvalues('cylinder', Infinity, 3);
    const sph = eigenvalues('sphere', Infinity, 3);
    const j0Zeros = [2.404825557695773, 5.520078110286311, 8.653727912911013];
    for (let i = 0; i < 3; i++) {
      expect(Math.abs(slab[i] - (i + 0.5) * Math.PI), `slab n=${i + 1} got ${slab[i]}`).toBeLessThan(EXACT_TOLERANCE * (i + 1) * 4);
      expect(Math.abs(cyl[i] - j0Zeros[i]), `cylinder n=${i + 1} got ${cyl[i]}, A&S ${j0Zeros[i]}`).toBeLessThan(EXACT_TOLERANCE * (i + 1) * 8);
      expect(Math.abs(sph[i] - (i + 1) * Math.PI), `sphere n=${i + 1} got ${sph[i]}`).toBeLessThan(EXACT_TOLERANCE * (i + 1) * 8);
    }
    // C1 at Bi = Infinity in closed form: 4/pi, 2/(j01 J1(j01)) with J1(j01) = 0.5191474973 (A&S Table 9.5, from
    // memory), and 2. (The printed Table 5.1 row for Bi = Infinity rounds some of these differently, so it is not used.)
    const LIMIT_TOLERANCE = 1e-13;
    const limits: [SeriesGeometry, number, number][] = [['slab', slab[0], 4 / Math.PI], ['cylinder', cyl[0], 2 / (2.404825557695773 * 0.5191474973)], ['sphere', sph[0], 2]];
    for (const [geometry, lambda, expected] of limits) {
      const got = uniformStartCoefficient(geometry, lambda);
      const tol = geometry === 'cylinder' ? 1e-9 : LIMIT_TOLERANCE;
      expect(Math.abs(got - expected), `${geometry} C1(Bi=Inf) got ${got}, expected ${expected}, tol ${tol}`).toBeLessThan(tol);
    }
  });

  it('high-order roots approach their asymptotes (derived from the characteristic equations, Carslaw & Jaeger 2nd ed., from memory)', () => {
    // slab lambda_n ~ (n-1)pi + Bi/((n-1)pi); sphere ~ (n-1/2)pi + (Bi-1)/((n-1/2)pi);
    // cylinder ~ b + (Bi - 3/8)/b, b = (n - 3/4)pi (McMahon, A&S 9.5.12, plus the Bi shift). Next term O(1/b^3).
    const bi = 2;
    const n = 2000;
    const cases: [SeriesGeometry, number][] = [
      ['slab', (n - 1) * Math.PI + bi / ((n - 1) * Math.PI)],
      ['sphere', (n - 0.5) * Math.PI + (bi - 1) / ((n - 0.5) * Math.PI)],
      ['cylinder', (n - 0.75) * Math.PI + (bi - 3 / 8) / ((n - 0.75) * Math.PI)],
    ];
    const ASYMPTOTE_TOLERANCE = 20 / (n * Math.PI) ** 3 + 1e-12;
    for (const [geometry, expected] of cases) {
      const got = eigenvalues(geometry, bi, n)[n - 1];
      expect(Math.abs(got - expected), `${geometry} n=${n} Bi=${bi}: got ${got}, asymptote ${expected}, tol ${ASYMPTOTE_TOLERANCE}`).toBeLessThan(ASYMPTOTE_TOLERANCE);
    }
  });

  it('Bi = 1e-6 and 1e6 follow the small- and large-Bi limits', () => {
    // Small Bi: lambda1^2 ~ (d+1) Bi (1 - Bi/(2(d+3)) ...): slab sqrt(Bi)(1 - Bi/6), cylinder sqrt(2Bi)(1 - Bi/8),
    // sphere sqrt(3Bi)(1 - Bi/10) (Taylor series of the characteristic equations). Relative error O(Bi^2).
    const small = 1e-6;
    const LIMIT_RELATIVE_TOLERANCE = 1e-11;
    const lows: [SeriesGeometry, number][] = [['slab', Math.sqrt(small) * (1 - small / 6)], ['cylinder', Math.sqrt(2 * small) * (1 - small / 8)], ['sphere', Math.sqrt(3 * small) * (1 - small / 10)]];
    for (const [geometry, expected] of lows) {
      const got = eigenvalues(geometry, small, 1)[0];
      expect(Math.abs(got / expected - 1), `${geometry} Bi=1e-6 got ${got}, expected ${expected}`).toBeLessThan(LIMIT_RELATIVE_TOLERANCE);
      expect(Math.abs(uniformStartCoefficient(geometry, got) - 1), `${geometry} C1 -> 1`).toBeLessThan(1e-6);
    }
    // Large Bi: lambda1 ~ lambda_inf (1 - 1/Bi): pi/2, j01, pi (first-order perturbation of the Dirichlet root).
    const big = 1e6;
    const highs: [SeriesGeometry, number][] = [['slab', Math.PI / 2], ['cylinder', 2.404825557695773], ['sphere', Math.PI]];
    for (const [geometry, limit] of highs) {
      const got = eigenvalues(geometry, big, 1)[0];
      const expected = limit * (1 - 1 / big);
      expect(Math.abs(got / expected - 1), `${geometry} Bi=1e6 got ${got}, expected ${expected}`).toBeLessThan(2 / big ** 2);
    }
  });

  it('never skips or repeats a root: 3000 roots per case, strictly increasing, one per interval, residual ~0', () => {
    const RESIDUAL_TOLERANCE = 1e-12;
    for (const geometry of GEOMETRIES) {
      for (const bi of [1e-6, 0.3, 1, 7, 1e6]) {
        const roots = eigenvalues(geometry, bi, 3000);
        const faults: string[] = [];
        for (let i = 0; i < roots.length; i++) {
          const n = i + 1;
          // Every root lies in ((n-1) pi, n pi) (slab and cylinder even in its lower half).
          if (!(roots[i] > (n - 1) * Math.PI && roots[i] < n * Math.PI)) faults.push(`n=${n}: ${roots[i]} outside ((n-1)pi, n pi)`);
          if (i > 0 && !(roots[i] > roots[i - 1])) faults.push(`n=${n}: not increasing`);
          const r = residual(geometry, bi, roots[i]);
          if (!(Math.abs(r) < RESIDUAL_TOLERANCE * Math.max(1, roots[i]))) faults.push(`n=${n}: residual ${r}`);
        }
        expect(faults.slice(0, 5), `${geometry} Bi=${bi}, tol ${RESIDUAL_TOLERANCE}`).toEqual([]);
      }
    }
  });
});
