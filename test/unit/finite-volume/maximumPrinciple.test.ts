// Maximum principle: with convection alone, no temperature (nodes, samples) leaves the range spanned by the start
// field and the medium. Protter and Weinberger, Maximum Principles in Differential Equations, 1967, Ch. 3 (from memory).
// Property test over random shapes, Bi, Fo, heating or cooling, uniform or non-uniform start.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { solveFiniteVolumeStage } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import type { Field } from '@/engine/fields';
import { ALPHA_M2_PER_S, CONSTANT_K_W_PER_MK, LENGTH_M, convection, problemOf, solved } from './stageProblemFixture';
import type { Shape1D } from './exactSeries1D';

/**
 * Allowed overshoot, K: the temperatures are iterated to a Newton residual of 1e-4 of the local step tolerance, and the Hermite
 * samples between steps may overshoot by the local time error (a tenth of the 0.05 K tolerance used here).
 */
const NODE_SLACK_K = 1e-6;
const SAMPLE_SLACK_K = 0.005;

describe('maximum principle (convection only)', () => {
  it('no node or sample leaves [min(start, medium), max(start, medium)]', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<Shape1D>('slab', 'cylinder', 'sphere'),
        fc.double({ min: -2, max: 2, noNaN: true }),
        fc.double({ min: -2.5, max: 0.5, noNaN: true }),
        fc.double({ min: 280, max: 1300, noNaN: true }),
        fc.double({ min: 280, max: 1300, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (shape, log10Bi, log10Fo, startK, mediumK, tilt) => {
          const bi = 10 ** log10Bi;
          // A start field that is linear in x between startK at the centre and a tilted surface value.
          const surfaceStartK = startK + tilt * (mediumK - startK);
          const start: Field = tilt === 0 ? { kind: 'uniform', temperatureK: startK } : { kind: 'grid-1d', geometry: shape, lengthM: LENGTH_M, nodesM: Float64Array.of(0, LENGTH_M), temperaturesK: Float64Array.of(startK, surfaceStartK) };
          const s = solved(
            solveFiniteVolumeStage(
              problemOf({ shape, medium: convection(mediumK, (bi * CONSTANT_K_W_PER_MK) / LENGTH_M), start, end: { kind: 'duration', seconds: (10 ** log10Fo * LENGTH_M ** 2) / ALPHA_M2_PER_S }, toleranceK: 0.05, sampleCount: 25 }),
            ),
          );
          const lo = Math.min(startK, surfaceStartK, mediumK);
          const hi = Math.max(startK, surfaceStartK, mediumK);
          if (s.endField.kind !== 'grid-1d') throw new Error('grid field expected');
          for (const t of s.endField.temperaturesK) {
            expect(t, `${shape} Bi=${bi} start ${startK}..${surfaceStartK} medium ${mediumK}: node ${t} outside [${lo}, ${hi}]`).toBeGreaterThanOrEqual(lo - NODE_SLACK_K);
            expect(t).toBeLessThanOrEqual(hi + NODE_SLACK_K);
          }
          for (const curve of Object.values(s.samples.temperaturesK)) {
            for (const t of curve ?? []) {
              expect(t, `${shape} Bi=${bi}: sample ${t} outside [${lo}, ${hi}]`).toBeGreaterThanOrEqual(lo - SAMPLE_SLACK_K);
              expect(t).toBeLessThanOrEqual(hi + SAMPLE_SLACK_K);
            }
          }
        },
      ),
      { numRuns: 40, seed: 20261201 },
    );
  });
});
