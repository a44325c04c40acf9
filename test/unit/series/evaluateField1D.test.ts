import { describe, expect, it } from 'vitest';
import { meanTemperature, temperatureAt } from '@/engine/methods/series/evaluateField1D';
import type { Field1D, Grid1DField, Series1DField } from '@/engine/fields';
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { eigenvalues } from '@/engine/methods/series/eigenvalues';
import { besselJ0 } from '@/engine/numerics/besselJ0';

const GEOMETRIES: SeriesGeometry[] = ['slab', 'cylinder', 'sphere'];
const POWER = { slab: 0, cylinder: 1, sphere: 2 } as const;

/** Reference mean by composite Simpson's rule on 20000 panels (Burden & Faires, Numerical Analysis, 9th ed., Sec. 4.4, from memory). */
function simpsonMean(field: Field1D, geometry: SeriesGeometry, lengthM: number): number {
  const panels = 20000;
  const h = lengthM / panels;
  const d = POWER[geometry];
  let sum = 0;
  for (let i = 0; i <= panels; i++) {
    const x = i * h;
    const w = i === 0 || i === panels ? 1 : i % 2 === 1 ? 4 : 2;
    sum += w * temperatureAt(field, x) * x ** d;
  }
  return ((d + 1) / lengthM ** (d + 1)) * (sum * h) / 3;
}

describe('evaluateField1D', () => {
  it('series field: value is offset + sum a_n X(lambda_n x/L) and the mean equals the numerical volume integral', () => {
    const MEAN_TOLERANCE_K = 1e-9; // Simpson with 20000 panels on a smooth profile is far better than this
    for (const geometry of GEOMETRIES) {
      const lengthM = 0.04;
      const lambda = eigenvalues(geometry, 3, 6);
      const field: Series1DField = { kind: 'series-1d', geometry, lengthM, offsetK: 300, eigenvalues: Float64Array.from(lambda), amplitudesK: Float64Array.from([400, -60, 25, 10, -5, 2]) };
      const x = 0.013;
      const z = (lambda[2] * x) / lengthM;
      const x3 = geometry === 'slab' ? Math.cos(z) : geometry === 'cylinder' ? besselJ0(z) : Math.sin(z) / z;
      const single: Series1DField = { ...field, eigenvalues: field.eigenvalues.subarray(2, 3), amplitudesK: field.amplitudesK.subarray(2, 3) };
      expect(Math.abs(temperatureAt(single, x) - (300 + 25 * x3)), `${geometry} single term`).toBeLessThan(1e-12);
      const got = meanTemperature(field);
      const expected = simpsonMean(field, geometry, lengthM);
      expect(Math.abs(got - expected), `${geometry}: mean got ${got}, Simpson ${expected}, tol ${MEAN_TOLERANCE_K}`).toBeLessThan(MEAN_TOLERANCE_K);
    }
  });

  it('grid field: linear between nodes, held at the ends; mean exact for a linear profile (T0 + (T1-T0) d+1/(d+2))', () => {
    const EXACT_TOLERANCE_K = 1e-12;
    for (const geometry of GEOMETRIES) {
      const d = POWER[geometry];
      const two: Grid1DField = { kind: 'grid-1d', geometry, lengthM: 0.02, nodesM: Float64Array.from([0, 0.02]), temperaturesK: Float64Array.from([900, 500]) };
      // (d+1) int_0^1 (T0 + (T1 - T0) x) x^d dx = T0 + (T1 - T0)(d+1)/(d+2).
      const expected = 900 - 400 * ((d + 1) / (d + 2));
      expect(Math.abs(meanTemperature(two) - expected), `${geometry} linear profile mean ${meanTemperature(two)} vs ${expected}`).toBeLessThan(EXACT_TOLERANCE_K);
      expect(temperatureAt(two, 0.005)).toBeCloseTo(800, 12);
      // Irregular nodes not reaching the ends: Simpson on the same piecewise-linear profile (kinks at nodes limit it to ~1e-7).
      const irregular: Grid1DField = { kind: 'grid-1d', geometry, lengthM: 0.02, nodesM: Float64Array.from([0.001, 0.004, 0.0041, 0.012, 0.019]), temperaturesK: Float64Array.from([880, 860, 850, 700, 540]) };
      const got = meanTemperature(irregular);
      const ref = simpsonMean(irregular, geometry, 0.02);
      expect(Math.abs(got - ref), `${geometry} irregular grid mean ${got} vs Simpson ${ref}`).toBeLessThan(1e-5);
      expect(temperatureAt(irregular, 0), 'held at the first node below it').toBe(880);
      expect(temperatureAt(irregular, 0.02), 'held at the last node beyond it').toBe(540);
    }
  });

  it('uniform field: value and mean are the temperature', () => {
    const u: Field1D = { kind: 'uniform', temperatureK: 1123.15 };
    expect(temperatureAt(u, 0.3)).toBe(1123.15);
    expect(meanTemperature(u)).toBe(1123.15);
  });
});
