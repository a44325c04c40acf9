// Limits of the finite shapes with temperature-dependent properties, a boiling-curve h and radiation, where no
// exact solution exists: at the mid-plane of a short cylinder 20 radii long the field is that of a long cylinder,
// and at the centre line of a block 20 times wider and longer than thick that of a plate. The reference is the
// 1-D finite-volume solver (TR-BDF2 on a surface-refined grid, checked against exact series in
// test/unit/finite-volume); the two solvers share no stepping code.
import { describe, expect, it } from 'vitest';
import { finiteVolume2DSolver } from '@/engine/methods/finite-volume-2d/solveFiniteVolume2DStage';
import { solveFiniteVolumeStage } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import type { Medium, PointId, Shape } from '@/schema/planSchema';
import { boilingBath, curveOf, finiteProblem, radiatingAir, solved, variableAlloy } from './finiteShapeFixture';

/** Guard against a stuck run on a loaded machine (the 3-D cases take about a second); not a speed check. */
const SLOW_CASE_TIMEOUT_MS = 60_000;

/**
 * The 2-D grid has 40 cells across the radius (20 mm), clustered towards the surface. In the boiling bath the
 * surface crosses the transition region, where h changes threefold over 120 K: measured 0.49 K at 32 s (0.90 K on
 * even cells, 0.24 K on 80 even cells: second order), so 1 K. In radiating air the fields are smooth: measured
 * 0.056 K, so 0.15 K. The 3-D grid has 20 cells across the half-thickness: measured 0.11 K in the bath, so 0.25 K.
 */
const BOILING_2D_K = 1.0;
const AIR_2D_K = 0.15;
const BOILING_3D_K = 0.25;

const cases: [string, Shape, Shape, number, [PointId, PointId][], Medium, number, number][] = [
  ['short cylinder 20 radii long in the boiling bath', { kind: 'short-cylinder', radiusM: 0.02, halfLengthM: 0.4 }, { kind: 'long-cylinder', radiusM: 0.02 }, 41, [['centre', 'centre'], ['face-x', 'surface']], boilingBath, 40, BOILING_2D_K],
  ['short cylinder 20 radii long in radiating air', { kind: 'short-cylinder', radiusM: 0.02, halfLengthM: 0.4 }, { kind: 'long-cylinder', radiusM: 0.02 }, 41, [['centre', 'centre'], ['face-x', 'surface']], radiatingAir, 600, AIR_2D_K],
  ['block 20 x 20 x 1 in the boiling bath', { kind: 'block', halfLengthM: 0.3, halfWidthM: 0.3, halfHeightM: 0.015 }, { kind: 'plate', halfThicknessM: 0.015 }, 21, [['centre', 'centre'], ['face-z', 'surface']], boilingBath, 40, BOILING_3D_K],
];

describe('finite shapes reduce to the 1-D finite-volume solution far from their ends', () => {
  for (const [name, finite, long, nodes, pairs, medium, seconds, toleranceK] of cases) {
    it(name, { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
      const s2 = solved(finiteVolume2DSolver({ nodesPerAxis: nodes })(finiteProblem({ shape: finite, material: variableAlloy, medium, end: { kind: 'duration', seconds }, sampleCount: 21 })));
      const s1 = solved(solveFiniteVolumeStage(finiteProblem({ shape: long, material: variableAlloy, medium, end: { kind: 'duration', seconds }, sampleCount: 21 })));
      let worstK = 0;
      let where = '';
      for (const [finiteId, longId] of pairs) {
        const a = curveOf(s2, finiteId);
        const b = curveOf(s1, longId);
        for (let i = 0; i < a.length; i++) {
          if (Math.abs(a[i] - b[i]) > worstK) {
            worstK = Math.abs(a[i] - b[i]);
            where = `${finiteId} ${a[i]} K vs 1-D ${longId} ${b[i]} K at t = ${s2.samples.timeS[i]} s`;
          }
        }
      }
      expect(worstK, `${name}: largest difference ${worstK} K (${where}), tolerance ${toleranceK} K`).toBeLessThan(toleranceK);
    });
  }
});
