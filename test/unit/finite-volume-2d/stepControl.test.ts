// Time-step control and sampling of the finite-shape solver through a water quench whose h(Ts) is a boiling curve
// with a steep nucleate-boiling peak (the plan fixture short-cylinder-hub.json, stage 2: the library's still-water
// curve, 350 -> 15000 W/(m² K) between 600 °C and 300 °C, on plain carbon steel from 1100 K to centre 300 °C).
// No exact solution exists, so the reference is the same solver on the same grid with a ten times smaller bound on
// the local error of a step: a time-step convergence check (Roache, Verification and Validation in Computational
// Science and Engineering, 1998, Ch. 5 (from memory)). The grid is held at 40 x 40 cells for both runs, so the
// difference is the time stepping and the sampling only; the grid's own error (the timing of the wetting front along the faces, 6-11 K
// at the face points and the rim on 40 cells) is bounded in wettingFrontGrid.test.ts.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { finiteVolume2DSolver } from '@/engine/methods/finite-volume-2d/solveFiniteVolume2DStage';
import { geometryOf } from '@/engine/geometry/geometry';
import { materialModel } from '@/engine/properties/materialModel';
import { surfaceBoundary } from '@/engine/properties/surfaceBoundary';
import { parsePlan } from '@/schema/parsePlan';
import type { StageProblem, StageSolution } from '@/engine/methods/stageProblem';
import type { PointId, Shape } from '@/schema/planSchema';
import { solved } from './finiteShapeFixture';
import { largestSampleDifference as largest } from '../largestSampleDifference';

/** Guard against a stuck run on a loaded machine (the tight runs take several seconds); not a speed check. */
const SLOW_CASE_TIMEOUT_MS = 120_000;
const TOLERANCE_K = 0.01;
/** The default 2-D grid, held fixed so that the tighter run refines only the steps. */
const NODES_PER_AXIS = 41;
/** The solver's own local-error bound at 0.01 K is 0.4 x 0.01 K; the reference takes an eighth of it. */
const REFERENCE_LOCAL_ERROR_K = 5e-4;
const START_K = 1100;
const CENTRE_TARGET_K = 573.15;
const SAMPLE_COUNT = 201;
/**
 * Time-stepping error at toleranceK 0.01 K (local error per step held to 4e-3 K). Measured against the eight times
 * tighter run (its own error is about a fifth): short cylinder 0.40 K at the faces, 0.22 K at the rim, 0.02 K at the
 * centre, 0.03 K mean; bar 0.35-0.41 K at the faces, 0.20 K at the edge, 0.02 K at the centre and mean (on the
 * beta 1.5 grid, whose time error near the wetting front is larger than on the former beta 2 grid: there a half of the tolerance gave
 * 0.15-0.37 K). The brief's aim was 0.1 K; a local bound of 1e-3 K (a tenth of the tolerance, cut to 1e-4 K
 * in transition boiling) met it (0.05 K) but took 3.6 times the steps, and the runner's refined cross-check of the
 * hub plan three times that, past what the plan command's test allows. The bound is 1.2 times the largest measured;
 * the arithmetic is deterministic. Since the Picard iteration starts from the quadratic extrapolation (a different
 * step sequence, 1078 steps for the short cylinder): short cylinder 0.40-0.42 K at the faces, 0.22 K at the rim, 0.02 K
 * at the centre, 0.03 K mean; bar 0.32-0.43 K at the faces, 0.13 K at the edge, 0.02 K at the centre and mean (the
 * bound is now 1.16 times the largest). Before this control the short cylinder's target-ended samples were 25-38 K off
 * (their duration-ended ones 1.3-1.6 K).
 */
const TIME_ERROR_K = 0.5;
/**
 * A point-temperature end and a duration end of the same length take the same steps up to the last one and are
 * sampled by the same Hermite rule, so their samples agree far closer than the time error (measured below 1e-3 K).
 */
const SAME_STEPS_K = 0.01;

const plan = parsePlan(JSON.parse(readFileSync('test/fixtures/plans/short-cylinder-hub.json', 'utf8')));
if (!plan.ok) throw new Error(`fixture plan does not parse: ${JSON.stringify(plan.issues)}`);
const { part, stages } = plan.plan;
const water = stages[1].medium;
const solve = finiteVolume2DSolver({ nodesPerAxis: NODES_PER_AXIS });
const solveTight = finiteVolume2DSolver({ nodesPerAxis: NODES_PER_AXIS, localErrorK: REFERENCE_LOCAL_ERROR_K });

function quench(shape: Shape, end: StageProblem['end'], toleranceK: number, solver = solve): StageSolution {
  return solved(
    solver({ geometry: geometryOf(shape), material: materialModel(part.material), boundary: surfaceBoundary(water), start: { kind: 'uniform', temperatureK: START_K }, end, toleranceK, sampleCount: SAMPLE_COUNT, propertyTemperatureK: 800 }),
  );
}

const shapes: [string, Shape][] = [
  ['short cylinder r0 30 mm, half-length 25 mm', part.shape],
  ['bar 60 x 50 mm', { kind: 'bar', halfWidthM: 0.03, halfHeightM: 0.025 }],
];

describe('step control through a water boiling curve (40 x 40 cells held fixed)', () => {
  for (const [name, shape] of shapes) {
    it(`${name}: centre to 300 °C; target-ended samples vs a duration run with ten times tighter steps`, { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
      const target = quench(shape, { kind: 'point-temperature', point: 'centre', temperatureK: CENTRE_TARGET_K }, TOLERANCE_K);
      expect(Math.abs(target.samples.temperaturesK.centre!.at(-1)! - CENTRE_TARGET_K), 'centre lands on 300 °C').toBeLessThan(1e-3);
      const reference = quench(shape, { kind: 'duration', seconds: target.durationS }, TOLERANCE_K, solveTight);
      const sameSteps = quench(shape, { kind: 'duration', seconds: target.durationS }, TOLERANCE_K);
      for (const id of Object.keys(target.samples.temperaturesK) as PointId[]) {
        const time = largest(target, reference, id);
        expect(time.differenceK, `${name}, ${id}: target-ended vs duration-ended with local error ${REFERENCE_LOCAL_ERROR_K} K over ${target.durationS.toFixed(2)} s, largest ${time.differenceK.toFixed(4)} K (${time.where}), bound ${TIME_ERROR_K} K`).toBeLessThan(TIME_ERROR_K);
        const same = largest(target, sameSteps, id);
        expect(same.differenceK, `${name}, ${id}: target-ended vs duration-ended, both at ${TOLERANCE_K} K, largest ${same.differenceK.toFixed(5)} K (${same.where}), bound ${SAME_STEPS_K} K`).toBeLessThan(SAME_STEPS_K);
      }
    });
  }
});
