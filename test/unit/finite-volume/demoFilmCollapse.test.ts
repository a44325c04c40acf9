// Regression on the demo plan's water quench (src/library/plans/demo-plan.json, stage 2: 40 mm bar, plain carbon
// steel tables, boiling-curve h), started from the plan's uniform 870 °C and run for 60 s, through the film
// collapse near 56 s. The automatic grid and steps at the plan tolerance must agree with a 30 times tighter run
// within the tolerance at every reported sample (self-convergence: for a second-order method the tighter run is about
// 30^(2/3) ~ 10 times closer to the exact answer, so it serves as the reference; Hairer, Norsett and Wanner,
// Solving ODEs I, 2nd ed., Sec. II.4, tolerance proportionality (from memory)).
// Before the transition-boiling rule and the 0.03 time share the surface was 0.039 K off at 56.4 s.
import { describe, expect, it } from 'vitest';
import { geometryOf } from '@/engine/geometry/geometry';
import { materialModel } from '@/engine/properties/materialModel';
import { surfaceBoundary } from '@/engine/properties/surfaceBoundary';
import type { StageProblem } from '@/engine/methods/stageProblem';
import { solveFiniteVolumeStage } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import { parsePlan } from '@/schema/parsePlan';
import demo from '@/library/plans/demo-plan.json';
import { solved } from './stageProblemFixture';
import { largestSampleDifference } from '../largestSampleDifference';

const TOLERANCE_K = 0.01;
const REFERENCE_FACTOR = 30;
const QUENCH_S = 60;
/** Where the surface is still in film boiling, and where the collapse has passed (the curve falls fastest between). */
const FILM_SURFACE_ABOVE_K = 600 + 273.15;
const COLLAPSED_SURFACE_BELOW_K = 300 + 273.15;

describe('demo water quench through the film collapse', () => {
  it(`every sample within ${TOLERANCE_K} K of a ${REFERENCE_FACTOR}x tighter run`, () => {
    const parsed = parsePlan(demo);
    if (!parsed.ok) throw new Error('the demo plan does not parse');
    const plan = parsed.plan;
    const problem = (toleranceK: number): StageProblem => ({
      geometry: geometryOf(plan.part.shape),
      material: materialModel(plan.part.material),
      boundary: surfaceBoundary(plan.stages[1].medium),
      start: { kind: 'uniform', temperatureK: plan.initialTemperature },
      end: { kind: 'duration', seconds: QUENCH_S },
      toleranceK,
      sampleCount: 201,
      propertyTemperatureK: plan.initialTemperature,
    });
    const run = solved(solveFiniteVolumeStage(problem(TOLERANCE_K)));
    const reference = solved(solveFiniteVolumeStage(problem(TOLERANCE_K / REFERENCE_FACTOR)));
    const surface = run.samples.temperaturesK.surface as Float64Array;
    // The stage goes through the collapse: film boiling in the first half, below 300 °C at the end.
    expect(surface[100], `surface at ${run.samples.timeS[100]} s: ${surface[100]} K`).toBeGreaterThan(FILM_SURFACE_ABOVE_K);
    expect(surface[200], `surface at the end: ${surface[200]} K`).toBeLessThan(COLLAPSED_SURFACE_BELOW_K);
    for (const point of ['centre', 'surface', 'mean'] as const) {
      const { differenceK, where } = largestSampleDifference(run, reference, point);
      expect(differenceK, `${point}: largest difference ${differenceK} K at ${where}, tolerance ${TOLERANCE_K} K`).toBeLessThan(TOLERANCE_K);
    }
  });
});
