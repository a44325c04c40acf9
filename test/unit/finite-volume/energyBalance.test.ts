// Energy accounting with temperature-dependent k and rho cp (with a narrow cp peak), a boiling-curve h and radiation.
// 1) The solver's own balance: heat through the surface against the change of stored energy, below 1e-6.
// 2) An independent check of heatRemovedJ: the stored energy of the start and end fields recomputed here from the
//    plan's own property tables (adaptive Simpson on e(T) = integral of rho cp dT, volume integral by the trapezoid
//    rule on the end field's nodes): Burden and Faires, Numerical Analysis, 9th ed., Secs. 4.3 and 4.6 (from memory).
import { describe, expect, it } from 'vitest';
import { solveFiniteVolumeStage } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import { materialModel } from '@/engine/properties/materialModel';
import { geometryOf } from '@/engine/geometry/geometry';
import type { Field } from '@/engine/fields';
import type { Medium } from '@/schema/planSchema';
import { type Shape1D } from './exactSeries1D';
import { boilingBath, problemOf, radiatingAir, shapeOf, solved, variableMaterial } from './stageProblemFixture';

/** The brief's bound on the solver's own balance. */
const BALANCE_TOLERANCE = 1e-6;
/**
 * The independent recomputation integrates the piecewise-linear end field on its nodes (trapezoid, second order):
 * agreement to 2e-4 of the heat removed is what that quadrature allows on these grids.
 */
const INDEPENDENT_TOLERANCE = 2e-4;
const START_K = 1150;

function adaptiveSimpson(f: (x: number) => number, a: number, b: number, tol: number, depth = 0): number {
  const c = 0.5 * (a + b);
  const whole = ((b - a) / 6) * (f(a) + 4 * f(c) + f(b));
  const left = ((c - a) / 6) * (f(a) + 4 * f(0.5 * (a + c)) + f(c));
  const right = ((b - c) / 6) * (f(c) + 4 * f(0.5 * (c + b)) + f(b));
  if (depth > 40 || Math.abs(left + right - whole) < 15 * tol) return left + right;
  return adaptiveSimpson(f, a, c, tol / 2, depth + 1) + adaptiveSimpson(f, c, b, tol / 2, depth + 1);
}

const model = materialModel(variableMaterial);
/** e(T) - e(START_K), J/m³, from the plan's tables. */
const enthalpyFromStart = (t: number) => -adaptiveSimpson((x) => model.volumetricHeatCapacity(x), t, START_K, 1e-3);

/** Heat given up from a uniform START_K to the end field, on the geometry's basis. */
function heatFromFields(shape: Shape1D, end: Field): number {
  if (end.kind !== 'grid-1d') throw new Error('expected a grid field');
  const m = shape === 'slab' ? 0 : shape === 'cylinder' ? 1 : 2;
  const geometry = geometryOf(shapeOf(shape, end.lengthM));
  const x = end.nodesM;
  let integral = 0;
  for (let i = 0; i + 1 < x.length; i++) {
    const fa = -enthalpyFromStart(end.temperaturesK[i]) * x[i] ** m;
    const fb = -enthalpyFromStart(end.temperaturesK[i + 1]) * x[i + 1] ** m;
    integral += 0.5 * (fa + fb) * (x[i + 1] - x[i]);
  }
  const reducedVolume = end.lengthM ** (m + 1) / (m + 1);
  return (integral * geometry.volumeM3) / reducedVolume;
}

const cases: [Shape1D, string, Medium, number][] = [
  ['slab', 'radiating air', radiatingAir, 200],
  ['cylinder', 'boiling-curve bath', boilingBath, 60],
  ['sphere', 'boiling-curve bath', boilingBath, 60],
  ['cylinder', 'radiating air', radiatingAir, 300],
];

describe('energy balance with variable properties', () => {
  for (const [shape, mediumName, medium, seconds] of cases) {
    it(`${shape} in ${mediumName}, ${seconds} s: balance below ${BALANCE_TOLERANCE}, heat removed as recomputed from the fields`, () => {
      const s = solved(solveFiniteVolumeStage(problemOf({ shape, lengthM: 0.03, material: variableMaterial, medium, start: { kind: 'uniform', temperatureK: START_K }, end: { kind: 'duration', seconds } })));
      expect(s.energyRelativeError, `${shape} ${mediumName}: energyRelativeError ${s.energyRelativeError}`).not.toBeNull();
      expect(s.energyRelativeError as number).toBeLessThan(BALANCE_TOLERANCE);
      const independent = heatFromFields(shape, s.endField);
      const rel = Math.abs(s.heatRemovedJ - independent) / Math.abs(independent);
      expect(rel, `${shape} ${mediumName}: heatRemovedJ ${s.heatRemovedJ}, recomputed ${independent}, relative difference ${rel}, tolerance ${INDEPENDENT_TOLERANCE}`).toBeLessThan(INDEPENDENT_TOLERANCE);
      // The part lost heat and the end field cooled through the cp peak (1000 K) at the surface.
      expect(s.heatRemovedJ).toBeGreaterThan(0);
    });
  }
});
