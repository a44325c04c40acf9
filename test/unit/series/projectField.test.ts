import { describe, expect, it } from 'vitest';
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import type { Grid1DField, Series1DField } from '@/engine/fields';
import { projectField } from '@/engine/methods/series/projectField';
import { eigenvalues } from '@/engine/methods/series/eigenvalues';
import { eigenfunction, eigenfunctionNorm, uniformStartCoefficient } from '@/engine/methods/series/eigenfunction';
import { temperatureAt } from '@/engine/methods/series/evaluateField1D';

const GEOMETRIES: SeriesGeometry[] = ['slab', 'cylinder', 'sphere'];
const POWER = { slab: 0, cylinder: 1, sphere: 2 } as const;
const L = 0.05;
const MEDIUM_K = 330;

/** Reference b_n: composite Simpson of (T - T_inf) X_n x^d over panels aligned with any grid nodes (Burden & Faires, 9th ed., Sec. 4.4, from memory). */
function simpsonCoefficient(field: Series1DField | Grid1DField, g: SeriesGeometry, lambda: number, panels: number): number {
  const h = 1 / panels;
  const f = (x: number) => (temperatureAt(field, x * L) - MEDIUM_K) * eigenfunction(g, lambda * x) * x ** POWER[g];
  let s = f(0) + f(1);
  for (let i = 1; i < panels; i++) s += (i % 2 === 1 ? 4 : 2) * f(i * h);
  return (s * h) / 3 / eigenfunctionNorm(g, lambda);
}

describe('projection of a start field onto a stage\'s eigenfunctions', () => {
  it('uniform field gives (T - T_inf) C_n exactly', () => {
    for (const g of GEOMETRIES) {
      const lambdas = eigenvalues(g, 4, 30);
      const b = projectField({ kind: 'uniform', temperatureK: 1100 }, g, L, MEDIUM_K, lambdas);
      for (let n = 0; n < 30; n++) expect(b[n]).toBe((1100 - MEDIUM_K) * uniformStartCoefficient(g, lambdas[n]));
    }
  });

  it('a series field of the same Bi (offset at the medium) projects back onto itself (orthogonality)', () => {
    const ORTHOGONALITY_TOLERANCE_K = 1e-10;
    for (const g of GEOMETRIES) {
      const lambdas = Float64Array.from(eigenvalues(g, 2.5, 40));
      const amplitudes = Float64Array.from({ length: 40 }, (_, n) => 500 / (n + 1) ** 2 * (n % 2 ? -1 : 1));
      const field: Series1DField = { kind: 'series-1d', geometry: g, lengthM: L, offsetK: MEDIUM_K, eigenvalues: lambdas, amplitudesK: amplitudes };
      const b = projectField(field, g, L, MEDIUM_K, lambdas);
      for (let n = 0; n < 40; n++) expect(Math.abs(b[n] - amplitudes[n]), `${g} n=${n + 1}: got ${b[n]}, expected ${amplitudes[n]}`).toBeLessThan(ORTHOGONALITY_TOLERANCE_K);
    }
  });

  it('a series field of another Bi: closed-form inner products equal numerical integration', () => {
    // Simpson's own error, ~ (h lambda)^4 / 180 x the ~600 K excess with h = 1/8000, is ~1e-9 K; 3e-8 K is 5e-11 of the excess.
    const QUADRATURE_TOLERANCE_K = 3e-8;
    for (const g of GEOMETRIES) {
      const old = Float64Array.from(eigenvalues(g, 0.7, 8));
      const field: Series1DField = { kind: 'series-1d', geometry: g, lengthM: L, offsetK: 300, eigenvalues: old, amplitudesK: Float64Array.from([420, -35, 12, -6, 3, -1.5, 0.8, -0.4]) };
      const lambdas = eigenvalues(g, 30, 12);
      const b = projectField(field, g, L, MEDIUM_K, lambdas);
      for (let n = 0; n < 12; n++) {
        const ref = simpsonCoefficient(field, g, lambdas[n], 8000);
        expect(Math.abs(b[n] - ref), `${g} n=${n + 1}: closed form ${b[n]}, Simpson ${ref}, tol ${QUADRATURE_TOLERANCE_K}`).toBeLessThan(QUADRATURE_TOLERANCE_K);
      }
    }
  });

  it('nearly equal eigenvalues (Bi differing by 1e-9) still give the field back', () => {
    const NEAR_TOLERANCE_K = 1e-7;
    for (const g of GEOMETRIES) {
      const old = Float64Array.from(eigenvalues(g, 3, 10));
      const amplitudes = Float64Array.from({ length: 10 }, (_, n) => 100 / (n + 1));
      const field: Series1DField = { kind: 'series-1d', geometry: g, lengthM: L, offsetK: MEDIUM_K, eigenvalues: old, amplitudesK: amplitudes };
      const b = projectField(field, g, L, MEDIUM_K, eigenvalues(g, 3 + 3e-9, 10));
      for (let n = 0; n < 10; n++) expect(Math.abs(b[n] - amplitudes[n]), `${g} n=${n + 1}: got ${b[n]}, expected ${amplitudes[n]}`).toBeLessThan(NEAR_TOLERANCE_K);
    }
  });

  it('grid field: a flat grid gives the uniform C_n; an irregular grid matches node-aligned Simpson', () => {
    const FLAT_TOLERANCE_K = 1e-11;
    const GRID_TOLERANCE_K = 3e-8; // as above: 5e-11 of the ~600 K excess
    for (const g of GEOMETRIES) {
      const lambdas = eigenvalues(g, 6, 25);
      const flat: Grid1DField = { kind: 'grid-1d', geometry: g, lengthM: L, nodesM: Float64Array.from([0, 0.3 * L, L]), temperaturesK: Float64Array.from([900, 900, 900]) };
      const bf = projectField(flat, g, L, MEDIUM_K, lambdas);
      for (let n = 0; n < 25; n++) {
        const expected = (900 - MEDIUM_K) * uniformStartCoefficient(g, lambdas[n]);
        expect(Math.abs(bf[n] - expected), `${g} flat grid n=${n + 1}: ${bf[n]} vs ${expected}`).toBeLessThan(FLAT_TOLERANCE_K * 1000);
      }
      // Nodes on multiples of 1/40 of L so that Simpson panels (1/8000) never straddle a kink.
      const nodes = [0, 3, 7, 8, 15, 26, 33, 39, 40].map((i) => (i / 40) * L);
      const temps = [950, 948, 930, 925, 880, 760, 640, 560, 520];
      const grid: Grid1DField = { kind: 'grid-1d', geometry: g, lengthM: L, nodesM: Float64Array.from(nodes), temperaturesK: Float64Array.from(temps) };
      const b = projectField(grid, g, L, MEDIUM_K, lambdas);
      for (let n = 0; n < 25; n++) {
        const ref = simpsonCoefficient(grid, g, lambdas[n], 8000);
        expect(Math.abs(b[n] - ref), `${g} grid n=${n + 1}: Gauss ${b[n]}, Simpson ${ref}, tol ${GRID_TOLERANCE_K}`).toBeLessThan(GRID_TOLERANCE_K);
      }
    }
  });
});
