// Three stages in a chain (radiating air, boiling-curve water, radiating air) from a non-uniform start, with
// temperature-dependent properties: each stage balances its energy, the end state of one stage is the start of the
// next (curves continuous across the joint), and the heat removed over the chain matches the stored-energy change
// between the first start field and the last end field recomputed from the plan's tables (fieldEnergy.ts).
import { describe, expect, it } from 'vitest';
import { solveFiniteVolumeStage } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import type { Field } from '@/engine/fields';
import type { StageProblem, StageSolution } from '@/engine/methods/stageProblem';
import type { Medium } from '@/schema/planSchema';
import type { Shape1D } from './exactSeries1D';
import { storedHeatBetween } from './fieldEnergy';
import { boilingBath, problemOf, radiatingAir, solved, variableMaterial } from './stageProblemFixture';

const LENGTH_M = 0.025;
const TOLERANCE_K = 0.01;
const BALANCE_TOLERANCE = 1e-6;
/** Over the chain the reference integrates grid fields by the trapezoid rule (second order): 2e-4 of the heat. */
const CHAIN_TOLERANCE = 2e-4;
/**
 * At a joint the next stage may put the field on a finer grid (linear interpolation between the old nodes):
 * the joint values agree to the tolerance.
 */
const JOINT_TOLERANCE_K = TOLERANCE_K;

function parabolicStart(shape: Shape1D): Field {
  const nodesM = Float64Array.from({ length: 9 }, (_, i) => (LENGTH_M * i) / 8);
  return { kind: 'grid-1d', geometry: shape, lengthM: LENGTH_M, nodesM, temperaturesK: nodesM.map((x) => 1150 - 80 * (x / LENGTH_M) ** 2) };
}

describe('stage chaining through three media', () => {
  for (const shape of ['slab', 'cylinder', 'sphere'] as Shape1D[]) {
    it(`${shape}: air with radiation 20 s, boiling bath until the centre is at 700 K, air 60 s`, () => {
      const stages: [Medium, StageProblem['end']][] = [
        [radiatingAir, { kind: 'duration', seconds: 20 }],
        [boilingBath, { kind: 'point-temperature', point: 'centre', temperatureK: 700 }],
        [radiatingAir, { kind: 'duration', seconds: 60 }],
      ];
      const first = parabolicStart(shape);
      let field = first;
      const done: StageSolution[] = [];
      for (const [medium, end] of stages) {
        const s = solved(solveFiniteVolumeStage(problemOf({ shape, lengthM: LENGTH_M, material: variableMaterial, medium, start: field, end, toleranceK: TOLERANCE_K, sampleCount: 31 })));
        expect(s.energyRelativeError as number, `${shape} stage ${done.length + 1} energy balance`).toBeLessThan(BALANCE_TOLERANCE);
        done.push(s);
        field = s.endField;
      }
      // The quench ended on its target.
      const quench = done[1].samples.temperaturesK.centre as Float64Array;
      expect(Math.abs(quench[quench.length - 1] - 700), `${shape} quench end centre ${quench[quench.length - 1]} K, target 700 K`).toBeLessThan(TOLERANCE_K);
      // Joints: the first sample of each stage equals the last of the one before.
      for (let i = 1; i < done.length; i++) {
        for (const point of ['centre', 'surface', 'mean'] as const) {
          const before = done[i - 1].samples.temperaturesK[point] as Float64Array;
          const after = done[i].samples.temperaturesK[point] as Float64Array;
          const jump = Math.abs(after[0] - before[before.length - 1]);
          expect(jump, `${shape} joint ${i} ${point}: end ${before[before.length - 1]} K, next start ${after[0]} K, tolerance ${JOINT_TOLERANCE_K} K`).toBeLessThan(JOINT_TOLERANCE_K);
        }
      }
      const heat = done.reduce((sum, s) => sum + s.heatRemovedJ, 0);
      const reference = storedHeatBetween(variableMaterial, shape, first, field);
      const rel = Math.abs(heat - reference) / Math.abs(reference);
      expect(rel, `${shape}: heat over the chain ${heat} J, stored-energy change ${reference} J, relative ${rel}, tolerance ${CHAIN_TOLERANCE}`).toBeLessThan(CHAIN_TOLERANCE);
    });
  }
});
