// Time accuracy through transition boiling, where the surface flux falls as the surface temperature rises and small
// errors grow: the stage at the plan tolerance must agree with the same grid at a 30 times tighter tolerance
// (self-convergence of the time integration: for a second-order method the tighter run is about 10 times closer to
// the exact answer, so it serves as the reference; Hairer, Norsett and Wanner, Solving ODEs I, 2nd ed., Sec. II.4,
// tolerance proportionality (from memory)).
import { describe, expect, it } from 'vitest';
import { solveFiniteVolumeStageWith } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import { boilingBath, problemOf, solved, variableMaterial } from './stageProblemFixture';
import { largestSampleDifference } from '../largestSampleDifference';

const TOLERANCE_K = 0.01;
/** The plan tolerance applies to each method; the runner's cross-check allows twice it. */
const ALLOWED_K = 2 * TOLERANCE_K;
const GRID = { cellCount: 120, stretch: 2 };

describe('transition boiling', () => {
  it('cylinder quenched through the film collapse: curves within twice the tolerance of a 30x tighter run', () => {
    const at = (toleranceK: number) =>
      solved(
        solveFiniteVolumeStageWith(
          problemOf({ shape: 'cylinder', lengthM: 0.02, material: variableMaterial, medium: boilingBath, start: { kind: 'uniform', temperatureK: 1150 }, end: { kind: 'duration', seconds: 40 }, toleranceK, sampleCount: 201 }),
          GRID,
        ),
      );
    const plan = at(TOLERANCE_K);
    const reference = at(TOLERANCE_K / 30);
    // The surface went through the whole boiling curve.
    const surface = plan.samples.temperaturesK.surface as Float64Array;
    expect(surface[surface.length - 1]).toBeLessThan(500);
    for (const point of ['centre', 'surface', 'mean'] as const) {
      const { differenceK, where } = largestSampleDifference(plan, reference, point);
      expect(differenceK, `${point}: largest difference ${differenceK} K at ${where}, allowed ${ALLOWED_K} K`).toBeLessThan(ALLOWED_K);
    }
  });
});
