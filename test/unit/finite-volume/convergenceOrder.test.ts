// Observed orders of accuracy on a fixed problem (slab and sphere, Bi 1, Fo 0.2, uniform start):
// in space against the exact series (exactSeries1D.ts, Carslaw and Jaeger, 2nd ed., Secs. 3.10, 9.9 (from memory)),
// in time against a run with a step 64 times shorter on the same grid (the spatial error cancels).
// Expected: 2 in space (second-order finite volumes, Patankar 1980, Sec. 4.2 (from memory)) and 2 in time
// (TR-BDF2, Hosea and Shampine, Appl. Numer. Math. 20 (1996) (from memory)).
import { describe, expect, it } from 'vitest';
import { exactTheta, type Shape1D } from './exactSeries1D';
import { solveFiniteVolumeStageWith } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import { ALPHA_M2_PER_S, CONSTANT_K_W_PER_MK, LENGTH_M, convection, lastOf, problemOf, solved } from './stageProblemFixture';

const START_K = 1100;
const MEDIUM_K = 300;
const SPAN_K = START_K - MEDIUM_K;
const BI = 1;
const FO = 0.2;
/** Orders measured on three refinements must lie within this of the design order (asymptotic range not exact). */
const ORDER_TOLERANCE = 0.25;

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
    it(`${shape}: about 2 in space (cells 10, 20, 40, 80, uniform grid)`, () => {
      const exact = exactTheta(shape, BI, FO);
      // Tight time tolerance so that the time error stays well below the smallest spatial error.
      const errors = [10, 20, 40, 80].map((cellCount) => {
        const s = solved(solveFiniteVolumeStageWith(problemFor(shape, 1e-5), { cellCount, stretch: 0 }));
        return Math.abs((lastOf(s, 'centre') - MEDIUM_K) / SPAN_K - exact.centre) + Math.abs((lastOf(s, 'surface') - MEDIUM_K) / SPAN_K - exact.surface);
      });
      for (let i = 0; i + 1 < errors.length; i++) {
        const p = order(errors[i], errors[i + 1]);
        expect(Math.abs(p - 2), `${shape} space order between refinements ${i} and ${i + 1}: errors ${errors.join(', ')}, order ${p}, expected 2 +- ${ORDER_TOLERANCE}`).toBeLessThan(ORDER_TOLERANCE);
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
