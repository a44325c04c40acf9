// The product solution for finite shapes against an independent exact reference: the product of 1-D exact
// series written out from the textbook formulas with J0, J1 from the `bessel` package (test/unit/finite-volume/
// exactSeries1D.ts, 200 terms). Product theorem: Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed.,
// Sec. 1.15; Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Sec. 5.8 (from memory).
// Heat: Langston's product rule Q/Q0 = 1 - prod_d (1 - (Q/Q0)_d) (Langston, Int. J. Heat Mass Transfer 25
// (1982) 149; Incropera 6th ed., Eq. 5.52 (from memory)).
// Limits: a short cylinder 20 radii long is a long cylinder at its mid-plane, a block 20 times wider and longer
// than thick is a slab at its centre (the far faces' factors differ from 1 by about erfc(10), far below tolerance).
import { describe, expect, it } from 'vitest';
import { solveProductStage } from '@/engine/methods/product/solveProductStage';
import type { Shape } from '@/schema/planSchema';
import { exactTheta } from '../finite-volume/exactSeries1D';
import { CP_J_PER_KGK, convection, curveOf, finiteProblem, flatBar, K_W_PER_MK, RHO_KG_PER_M3, shortCylinder, smallBlock, solved, START_K } from '../finite-volume-2d/finiteShapeFixture';

const MEDIUM_K = 333;
const H_W_PER_M2K = 800;
const ALPHA_M2_PER_S = K_W_PER_MK / (RHO_KG_PER_M3 * CP_J_PER_KGK);
/** The solver is asked for 1e-4 K; the 200-term reference is exact to rounding at these Fo (>= 0.01). */
const SOLVER_TOLERANCE_K = 1e-4;
const AGREEMENT_K = 1e-3;
const HEAT_RELATIVE = 1e-6;

function axesOf(shape: Shape): { geometry: 'slab' | 'cylinder'; lengthM: number }[] {
  if (shape.kind === 'short-cylinder') return [{ geometry: 'cylinder', lengthM: shape.radiusM }, { geometry: 'slab', lengthM: shape.halfLengthM }];
  if (shape.kind === 'bar') return [{ geometry: 'slab', lengthM: shape.halfWidthM }, { geometry: 'slab', lengthM: shape.halfHeightM }];
  if (shape.kind === 'block') return [{ geometry: 'slab', lengthM: shape.halfLengthM }, { geometry: 'slab', lengthM: shape.halfWidthM }, { geometry: 'slab', lengthM: shape.halfHeightM }];
  throw new Error('not a finite shape');
}

/** Reference theta at the axis positions (null = volume mean) and time. */
function referenceTheta(shape: Shape, positionM: number[] | null, timeS: number): number {
  return axesOf(shape).reduce((product, axis, d) => {
    const exact = exactTheta(axis.geometry, (H_W_PER_M2K * axis.lengthM) / K_W_PER_MK, (ALPHA_M2_PER_S * timeS) / axis.lengthM ** 2);
    return product * (positionM ? exact.at(positionM[d] / axis.lengthM) : exact.mean);
  }, 1);
}

const DURATION_S = 240;

describe('product solution against the product of independent 1-D exact series', () => {
  for (const [name, shape] of [['short cylinder', shortCylinder], ['bar', flatBar], ['block', smallBlock]] as const) {
    it(`${name}: every reported point and the mean, over ${DURATION_S} s in oil`, () => {
      const problem = finiteProblem({ shape, medium: convection(MEDIUM_K, H_W_PER_M2K), end: { kind: 'duration', seconds: DURATION_S }, toleranceK: SOLVER_TOLERANCE_K, sampleCount: 25 });
      const s = solved(solveProductStage(problem));
      for (const point of problem.geometry.points) {
        const got = curveOf(s, point.id);
        for (let i = 1; i < got.length; i++) {
          const t = s.samples.timeS[i];
          const expected = MEDIUM_K + (START_K - MEDIUM_K) * referenceTheta(shape, point.positionM ?? null, t);
          expect(Math.abs(got[i] - expected), `${name} ${point.id} at t = ${t} s: got ${got[i]} K, expected ${expected} K, tolerance ${AGREEMENT_K} K`).toBeLessThan(AGREEMENT_K);
        }
      }
      const q0 = RHO_KG_PER_M3 * CP_J_PER_KGK * problem.geometry.volumeM3 * (START_K - MEDIUM_K);
      const langston = 1 - axesOf(shape).reduce((p, axis) => p * exactTheta(axis.geometry, (H_W_PER_M2K * axis.lengthM) / K_W_PER_MK, (ALPHA_M2_PER_S * DURATION_S) / axis.lengthM ** 2).mean, 1);
      const expectedHeat = langston * q0;
      expect(Math.abs(s.heatRemovedJ - expectedHeat) / expectedHeat, `${name} heat: got ${s.heatRemovedJ} J, Langston ${expectedHeat} J`).toBeLessThan(HEAT_RELATIVE);
    });
  }
});

describe('limits of the finite shapes', () => {
  const radiusM = 0.02;
  const halfM = 0.015;
  const cases: [string, Shape, 'slab' | 'cylinder', number, [string, number][]][] = [
    ['short cylinder 20 radii long -> long cylinder', { kind: 'short-cylinder', radiusM, halfLengthM: 20 * radiusM }, 'cylinder', radiusM, [['centre', 0], ['face-x', 1]]],
    ['block 20 x 20 x 1 -> slab', { kind: 'block', halfLengthM: 20 * halfM, halfWidthM: 20 * halfM, halfHeightM: halfM }, 'slab', halfM, [['centre', 0], ['face-z', 1]]],
  ];
  for (const [name, shape, geometry, lengthM, points] of cases) {
    it(name, () => {
      const s = solved(solveProductStage(finiteProblem({ shape, medium: convection(MEDIUM_K, H_W_PER_M2K), end: { kind: 'duration', seconds: 200 }, toleranceK: SOLVER_TOLERANCE_K, sampleCount: 11 })));
      for (const [id, xStar] of points) {
        const got = curveOf(s, id as 'centre');
        for (let i = 1; i < got.length; i++) {
          const fo = (ALPHA_M2_PER_S * s.samples.timeS[i]) / lengthM ** 2;
          const expected = MEDIUM_K + (START_K - MEDIUM_K) * exactTheta(geometry, (H_W_PER_M2K * lengthM) / K_W_PER_MK, fo).at(xStar);
          expect(Math.abs(got[i] - expected), `${name}, ${id} at Fo = ${fo}: got ${got[i]} K, 1-D exact ${expected} K, tolerance ${AGREEMENT_K} K`).toBeLessThan(AGREEMENT_K);
        }
      }
    });
  }
});
