// Observed orders of accuracy on a fixed problem (slab and sphere, Bi 1, Fo 0.2, uniform start):
// in space against the exact series (exactSeries1D.ts, Carslaw and Jaeger, 2nd ed., Secs. 3.10, 9.9 (from memory)),
// in time against a run with a step 64 times shorter on the same grid (the spatial error cancels).
// Expected: 2 in space for the plain scheme on one grid (second-order finite volumes, Patankar 1980, Sec. 4.2
// (from memory)), 4 for the Richardson pair of nested grids (Richardson, Phil. Trans. R. Soc. A 210 (1911)
// (from memory)), and 2 in time (TR-BDF2, Hosea and Shampine, Appl. Numer. Math. 20 (1996) (from memory)).
import { describe, expect, it } from 'vitest';
import { exactTheta, type Shape1D } from './exactSeries1D';
import { solveFiniteVolumeStageWith } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import { ALPHA_M2_PER_S, CONSTANT_K_W_PER_MK, LENGTH_M, convection, lastOf, problemOf, solved } from './stageProblemFixture';

const START_K = 1100;
const MEDIUM_K = 300;
const SPAN_K = START_K - MEDIUM_K;
const BI = 1;
const FO = 0.2;
/** Orders measured on successive refinements must lie within this of the design order (asymptotic range not exact). */
const ORDER_TOLERANCE = 0.25;
/** The extrapolated order approaches 4 more slowly (the next term is dx^6 with a larger constant). */
const EXTRAPOLATED_ORDER_TOLERANCE = 0.35;

const problemFor = (shape: Shape1D, toleranceK: number) =>
  problemOf({
    shape,
    medium: convection(MEDIUM_K, (BI * CONSTANT_K_W_PER_MK) / LENGTH_M),
    start: { kind: 'uniform', temperatureK: START_K },
    end: { kind: 'duration', seconds: (FO * LENGTH_M * LENGTH_M) / ALPHA_M2_PER_S },
    toleranceK,
  });

const order = (coarse: number, fine: number) => Math.log2(coarse / fine);

describe('convergence order', () => {
  for (const shape of ['slab', 'sphere'] as Shape1D[]) {
    it(`${shape}: about 2 in space for the plain scheme (cells 10, 20, 40, 80, uniform grid)`, () => {
      const exact = exactTheta(shape, BI, FO);
      // Tight time tolerance so that the time error stays well below the smallest spatial error.
      const errors = [10, 20, 40, 80].map((cellCount) => {
        const s = solved(solveFiniteVolumeStageWith(problemFor(shape, 1e-5), { cellCount, stretch: 0, extrapolate: false }));
        return Math.abs((lastOf(s, 'centre') - MEDIUM_K) / SPAN_K - exact.centre) + Math.abs((lastOf(s, 'surface') - MEDIUM_K) / SPAN_K - exact.surface);
      });
      for (let i = 0; i + 1 < errors.length; i++) {
        const p = order(errors[i], errors[i + 1]);
        expect(Math.abs(p - 2), `${shape} space order between refinements ${i} and ${i + 1}: errors ${errors.join(', ')}, order ${p}, expected 2 +- ${ORDER_TOLERANCE}`).toBeLessThan(ORDER_TOLERANCE);
      }
    });

    it(`${shape}: about 4 in space for the Richardson pair (coarse cells 4, 8, 16, uniform grids)`, () => {
      const exact = exactTheta(shape, BI, FO);
      const errors = [4, 8, 16].map((cellCount) => {
        const s = solved(solveFiniteVolumeStageWith(problemFor(shape, 1e-7), { cellCount, stretch: 0 }));
        return (['centre', 'surface', 'mean'] as const).reduce((sum, point) => sum + Math.abs((lastOf(s, point) - MEDIUM_K) / SPAN_K - exact[point]), 0);
      });
      for (let i = 0; i + 1 < errors.length; i++) {
        const p = order(errors[i], errors[i + 1]);
        expect(Math.abs(p - 4), `${shape} extrapolated space order: errors ${errors.join(', ')}, order ${p}, expected 4 +- ${EXTRAPOLATED_ORDER_TOLERANCE}`).toBeLessThan(EXTRAPOLATED_ORDER_TOLERANCE);
      }
    });

    it(`${shape}: about 2 in time (fixed steps, halved three times)`, () => {
      const durationS = (FO * LENGTH_M * LENGTH_M) / ALPHA_M2_PER_S;
      const grid = { cellCount: 40, stretch: 0 };
      const at = (steps: number) => lastOf(solved(solveFiniteVolumeStageWith(problemFor(shape, 1), { ...grid, fixedStepS: durationS / steps })), 'centre');
      const reference = at(2560);
      const errors = [5, 10, 20, 40].map((steps) => Math.abs(at(steps) - reference));
      for (let i = 0; i + 1 < errors.length; i++) {
        const p = order(errors[i], errors[i + 1]);
        expect(Math.abs(p - 2), `${shape} time order: errors ${errors.join(', ')} K, order ${p}, expected 2 +- ${ORDER_TOLERANCE}`).toBeLessThan(ORDER_TOLERANCE);
      }
    });
  }
});
