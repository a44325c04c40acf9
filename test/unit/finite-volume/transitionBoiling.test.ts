// Time accuracy through transition boiling, where the surface flux falls as the surface temperature rises and small
// errors grow: the stage at the plan tolerance must agree with the same grid at a 30 times tighter tolerance
// (self-convergence of the time integration: for a second-order method the tighter run is about 10 times closer to
// the exact answer, so it serves as the reference; Hairer, Norsett and Wanner, Solving ODEs I, 2nd ed., Sec. II.4,
// tolerance proportionality (from memory)).
import { describe, expect, it } from 'vitest';
import { solveFiniteVolumeStageWith } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import { boilingBath, problemOf, solved, variableMaterial } from './stageProblemFixture';

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
      const a = plan.samples.temperaturesK[point] as Float64Array;
      const b = reference.samples.temperaturesK[point] as Float64Array;
      let worst = 0, at_ = 0;
      for (let i = 0; i < a.length; i++) if (Math.abs(a[i] - b[i]) > worst) [worst, at_] = [Math.abs(a[i] - b[i]), i];
      expect(worst, `${point}: largest difference ${worst} K at t = ${plan.samples.timeS[at_]} s (${a[at_]} K against ${b[at_]} K), allowed ${ALLOWED_K} K`).toBeLessThan(ALLOWED_K);
    }
  });
});
