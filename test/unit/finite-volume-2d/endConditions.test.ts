// End conditions of both finite-shape solvers: a point reaching a temperature (located inside the step), targets
// that cannot be reached, points a shape does not have, the depth point and cancellation.
// The crossing time reference is the exact product solution, whose crossing is found by Brent's method on the
// series (Brent, Algorithms for Minimization without Derivatives, 1973, Ch. 4 (from memory)).
import { describe, expect, it } from 'vitest';
import { solveFiniteVolume2DStage } from '@/engine/methods/finite-volume-2d/solveFiniteVolume2DStage';
import { solveProductStage } from '@/engine/methods/product/solveProductStage';
import { fieldAtPoints } from '@/engine/fieldAtPoints';
import type { StageSolver } from '@/engine/methods/stageProblem';
import type { PointId, Shape } from '@/schema/planSchema';
import { convection, curveOf, finiteProblem, flatBar, shortCylinder, smallBlock, solved } from './finiteShapeFixture';

/** Guard against a stuck run on a loaded machine (the 3-D cases take about a second); not a speed check. */
const SLOW_CASE_TIMEOUT_MS = 60_000;

const OIL = convection(333, 800);
/** A crossing located inside the step lands on the target far closer than the reported tolerance (0.01 K). */
const LANDING_K = 1e-3;
/**
 * FV against exact crossing times: the FV temperature error near the crossing (below 0.15 K in oil, see
 * productAgreement) over the cooling rate there gives the allowance: 0.5 % of the time.
 */
const CROSSING_RELATIVE = 5e-3;

const solvers: [string, StageSolver][] = [['finite volume', solveFiniteVolume2DStage], ['product', solveProductStage]];

describe('point-temperature ends', () => {
  const targets: [string, Shape, PointId, number][] = [
    ['short cylinder', shortCylinder, 'centre', 700],
    ['short cylinder', shortCylinder, 'edge', 500],
    ['bar', flatBar, 'face-y', 600],
    ['block', smallBlock, 'corner', 450],
  ];
  for (const [name, shape, point, targetK] of targets) {
    it(`${name}: ${point} reaches ${targetK} K, both methods, same time`, { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
      const problem = finiteProblem({ shape, medium: OIL, end: { kind: 'point-temperature', point, temperatureK: targetK } });
      const exact = solved(solveProductStage(problem));
      const fv = solved(solveFiniteVolume2DStage(problem));
      for (const s of [exact, fv]) {
        const landed = curveOf(s, point).at(-1)!;
        expect(Math.abs(landed - targetK), `${s.method}: ${point} ends at ${landed} K, target ${targetK} K, tolerance ${LANDING_K} K`).toBeLessThan(LANDING_K);
        expect(s.samples.timeS.at(-1)).toBe(s.durationS);
      }
      const relative = Math.abs(fv.durationS - exact.durationS) / exact.durationS;
      expect(relative, `${name} ${point} -> ${targetK} K: FV ${fv.durationS} s, exact ${exact.durationS} s, tolerance ${CROSSING_RELATIVE} relative`).toBeLessThan(CROSSING_RELATIVE);
    });
  }

  for (const [method, solve] of solvers) {
    it(`${method}: a target below a bath at 333 K is unreachable`, { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
      const outcome = solve(finiteProblem({ shape: shortCylinder, medium: OIL, end: { kind: 'point-temperature', point: 'centre', temperatureK: 320 } }));
      expect(outcome.ok).toBe(false);
      if (!outcome.ok) expect(outcome.code).toBe('target-unreachable');
    });
    it(`${method}: the bath temperature itself is only approached, never reached`, { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
      const outcome = solve(finiteProblem({ shape: flatBar, medium: OIL, end: { kind: 'point-temperature', point: 'centre', temperatureK: 333 } }));
      expect(outcome.ok).toBe(false);
      if (!outcome.ok) expect(outcome.code).toBe('target-unreachable');
    });
    it(`${method}: a short cylinder has no corner`, { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
      const outcome = solve(finiteProblem({ shape: shortCylinder, medium: OIL, end: { kind: 'point-temperature', point: 'corner', temperatureK: 500 } }));
      expect(outcome.ok).toBe(false);
      if (!outcome.ok) expect(outcome.code).toBe('not-applicable');
    });
  }

  it('finite volume: a target in the radiation equilibrium band is approached only (radiation to hotter surroundings)', { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
    const medium = { name: 'test furnace air', temperature: 300, heatTransfer: { kind: 'constant' as const, hWPerM2K: 10 }, radiation: { emissivity: 0.9, surroundingsTemperature: 900 } };
    // The part settles between 300 K and 900 K, where convection loss equals radiation gain; 320 K lies below it.
    const outcome = solveFiniteVolume2DStage(finiteProblem({ shape: flatBar, medium, end: { kind: 'point-temperature', point: 'centre', temperatureK: 320 } }));
    expect(outcome.ok).toBe(false);
    if (!outcome.ok) expect(outcome.code).toBe('target-unreachable');
  });

  for (const [method, solve] of solvers) {
    it(`${method}: a cancelled stage stops with "aborted"`, { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
      const controller = new AbortController();
      controller.abort();
      const outcome = solve(finiteProblem({ shape: shortCylinder, medium: OIL, end: { kind: 'duration', seconds: 100 }, signal: controller.signal }));
      expect(outcome.ok).toBe(false);
      if (!outcome.ok) expect(outcome.code).toBe('aborted');
    });
  }
});

describe('the depth point and field look-ups', () => {
  it('depth 0 is the side, depth r0 the axis; both methods; fieldAtPoints reads the end fields alike', { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
    for (const [method, solve] of solvers) {
      const atSide = solved(solve(finiteProblem({ shape: shortCylinder, medium: OIL, end: { kind: 'duration', seconds: 60 }, depthM: 0 })));
      const atAxis = solved(solve(finiteProblem({ shape: shortCylinder, medium: OIL, end: { kind: 'duration', seconds: 60 }, depthM: shortCylinder.radiusM })));
      expect(Math.abs(curveOf(atSide, 'depth').at(-1)! - curveOf(atSide, 'face-x').at(-1)!), `${method}: depth 0 vs side`).toBeLessThan(1e-9);
      expect(Math.abs(curveOf(atAxis, 'depth').at(-1)! - curveOf(atAxis, 'centre').at(-1)!), `${method}: depth r0 vs centre`).toBeLessThan(1e-9);
      const geometry = finiteProblem({ shape: shortCylinder, medium: OIL, end: { kind: 'duration', seconds: 1 } }).geometry;
      const atPoints = fieldAtPoints(atSide.endField, geometry);
      for (const id of ['centre', 'face-x', 'face-z', 'edge', 'mean'] as const) {
        const fromField = atPoints[id];
        const fromSamples = curveOf(atSide, id).at(-1)!;
        expect(Math.abs(fromField! - fromSamples), `${method} ${id}: end field ${fromField} K, last sample ${fromSamples} K`).toBeLessThan(1e-9);
      }
    }
  });
});
