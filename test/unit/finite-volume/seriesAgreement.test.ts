// The finite-volume solver against the exact series for constant properties and a uniform start:
// all three shapes, Bi 0.01, 1, 100, Fo 0.01, 0.1, 1, centre / surface / mean.
// Reference: exactSeries1D.ts (Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed., Secs. 3.10, 7.7, 9.9 (from memory)).
import { describe, expect, it } from 'vitest';
import { exactSeriesField, exactTheta, firstTerm, type Shape1D } from './exactSeries1D';
import { solveFiniteVolumeStage, solveFiniteVolumeStageWith } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import { sizeGrid } from '@/engine/methods/finite-volume/sizeGrid';
import { ALPHA_M2_PER_S, CONSTANT_K_W_PER_MK, LENGTH_M, convection, lastOf, problemOf, solved } from './stageProblemFixture';

const START_K = 1100;
const MEDIUM_K = 300;
const SPAN_K = START_K - MEDIUM_K;
/** Required agreement in dimensionless temperature (the brief's figure). */
const THETA_TOLERANCE = 1e-4;
/** Solver tolerance handed in: 0.05 K is 6.25e-5 of the 800 K span, inside THETA_TOLERANCE. */
const SOLVER_TOLERANCE_K = 0.05;

const problemAt = (shape: Shape1D, bi: number, fo: number) =>
  problemOf({
    shape,
    medium: convection(MEDIUM_K, (bi * CONSTANT_K_W_PER_MK) / LENGTH_M),
    start: { kind: 'uniform', temperatureK: START_K },
    end: { kind: 'duration', seconds: (fo * LENGTH_M * LENGTH_M) / ALPHA_M2_PER_S },
    toleranceK: SOLVER_TOLERANCE_K,
  });

describe('the exact-series fixture', () => {
  // Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table 5.1, Bi = 1.0 row (from memory):
  // slab 0.8603 / 1.1191, cylinder 1.2558 / 1.2071, sphere 1.5708 / 1.2732. The table prints four decimals.
  const TABLE_ROUNDING = 1e-4;
  const rows: [Shape1D, number, number][] = [['slab', 0.8603, 1.1191], ['cylinder', 1.2558, 1.2071], ['sphere', 1.5708, 1.2732]];
  for (const [shape, eigenvalue, coefficient] of rows) {
    it(`${shape}, Bi 1: first eigenvalue and coefficient as in Incropera Table 5.1`, () => {
      const got = firstTerm(shape, 1);
      expect(Math.abs(got.eigenvalue - eigenvalue), `eigenvalue got ${got.eigenvalue}, expected ${eigenvalue}`).toBeLessThan(TABLE_ROUNDING);
      expect(Math.abs(got.coefficient - coefficient), `coefficient got ${got.coefficient}, expected ${coefficient}`).toBeLessThan(TABLE_ROUNDING);
    });
  }
});

describe('finite volume against the exact series (Carslaw and Jaeger)', () => {
  for (const shape of ['slab', 'cylinder', 'sphere'] as Shape1D[]) {
    for (const bi of [0.01, 1, 100]) {
      for (const fo of [0.01, 0.1, 1]) {
        it(`${shape}, Bi ${bi}, Fo ${fo}: centre, surface and mean within ${THETA_TOLERANCE} in theta`, () => {
          const solution = solved(solveFiniteVolumeStage(problemAt(shape, bi, fo)));
          const exact = exactTheta(shape, bi, fo);
          for (const point of ['centre', 'surface', 'mean'] as const) {
            const got = (lastOf(solution, point) - MEDIUM_K) / SPAN_K;
            const expected = exact[point];
            expect(Math.abs(got - expected), `${shape} Bi=${bi} Fo=${fo} ${point}: got theta ${got}, expected ${expected}, tolerance ${THETA_TOLERANCE}`).toBeLessThan(THETA_TOLERANCE);
          }
          expect(solution.energyRelativeError, 'energy balance').toBeLessThan(1e-6);
        });
      }
    }
  }
});

describe('grid sized from Bi and the tolerance, checked at two resolutions', () => {
  // Doubling the automatic grids (coarse and fine of the Richardson pair) must change the answer by less than the
  // space share of the tolerance: the change bounds the automatic grids' own spatial error.
  for (const shape of ['slab', 'sphere'] as Shape1D[]) {
    for (const bi of [1, 100]) {
      it(`${shape}, Bi ${bi}, Fo 0.1: automatic grids and twice as fine agree within the tolerance`, () => {
        const problem = problemAt(shape, bi, 0.1);
        const automatic = solved(solveFiniteVolumeStage(problem));
        if (automatic.endField.kind !== 'grid-1d') throw new Error('grid field expected');
        // The end field lies on the fine grid, 2N + 1 nodes for N coarse cells.
        const coarseCells = (automatic.endField.nodesM.length - 1) / 2;
        const stretch = sizeGrid(bi, SOLVER_TOLERANCE_K / SPAN_K).stretch;
        const doubled = solved(solveFiniteVolumeStageWith(problem, { cellCount: 2 * coarseCells, stretch }));
        for (const point of ['centre', 'surface', 'mean'] as const) {
          const change = Math.abs(lastOf(automatic, point) - lastOf(doubled, point));
          expect(change, `${shape} Bi=${bi} ${point}: automatic ${lastOf(automatic, point)} K, doubled ${lastOf(doubled, point)} K, tolerance ${SOLVER_TOLERANCE_K / 2} K`).toBeLessThan(SOLVER_TOLERANCE_K / 2);
        }
      });
    }
  }
});

describe('starting from an exact series field', () => {
  // The exact field at Fo 0.1 handed in as a series-1d start (40 terms: the neglected tail is below 1e-15 at Fo 0.1),
  // continued for Fo 0.1 more in the same medium, must match the exact series at Fo 0.2.
  for (const shape of ['slab', 'cylinder', 'sphere'] as Shape1D[]) {
    it(`${shape}, Bi 1: series-1d start at Fo 0.1, end at Fo 0.2 within ${THETA_TOLERANCE} in theta`, () => {
      const problem = { ...problemAt(shape, 1, 0.1), start: exactSeriesField(shape, 1, 0.1, LENGTH_M, START_K, MEDIUM_K, 40) };
      const solution = solved(solveFiniteVolumeStage(problem));
      const exact = exactTheta(shape, 1, 0.2);
      for (const point of ['centre', 'surface', 'mean'] as const) {
        const got = (lastOf(solution, point) - MEDIUM_K) / SPAN_K;
        expect(Math.abs(got - exact[point]), `${shape} ${point}: got theta ${got}, expected ${exact[point]}, tolerance ${THETA_TOLERANCE}`).toBeLessThan(THETA_TOLERANCE);
      }
    });
  }
});

describe('the depth point', () => {
  // depthM below the surface, x* = 1 - depthM / L, against the exact series at that position.
  for (const shape of ['slab', 'cylinder', 'sphere'] as Shape1D[]) {
    for (const depthFraction of [0.07, 0.3]) {
      it(`${shape}, Bi 10, Fo 0.05, depth ${depthFraction} L: within ${THETA_TOLERANCE} in theta`, () => {
        const problem = { ...problemAt(shape, 10, 0.05), depthM: depthFraction * LENGTH_M };
        const solution = solved(solveFiniteVolumeStage(problem));
        const got = (lastOf(solution, 'depth') - MEDIUM_K) / SPAN_K;
        const expected = exactTheta(shape, 10, 0.05).at(1 - depthFraction);
        expect(Math.abs(got - expected), `${shape} depth ${depthFraction} L: got theta ${got}, expected ${expected}, tolerance ${THETA_TOLERANCE}`).toBeLessThan(THETA_TOLERANCE);
      });
    }
  }
});
