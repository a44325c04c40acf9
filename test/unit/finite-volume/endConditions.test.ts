// End conditions: a point reaching a target temperature is located inside a step (the reported end value equals the
// target within the tolerance, and the end time agrees with the exact series' crossing time), and targets that cannot
// be met give the right codes. Reference: exactSeries1D.ts (Carslaw and Jaeger, 2nd ed., Secs. 3.10, 7.7, 9.9 (from memory)).
import { describe, expect, it } from 'vitest';
import { exactTheta, type Shape1D } from './exactSeries1D';
import { solveFiniteVolumeStage } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import { geometryOf } from '@/engine/geometry/geometry';
import { ALPHA_M2_PER_S, CONSTANT_K_W_PER_MK, LENGTH_M, convection, lastOf, problemOf, solved } from './stageProblemFixture';

const START_K = 1100;
const MEDIUM_K = 300;
const SPAN_K = START_K - MEDIUM_K;
const TOLERANCE_K = 0.01;
const BI = 2;
const H_W_PER_M2K = (BI * CONSTANT_K_W_PER_MK) / LENGTH_M;
const DEPTH_M = 0.01;

/** Exact Fo at which theta at x* falls to thetaTarget (bisection on the monotone exact curve). */
function exactCrossingFo(shape: Shape1D, point: 'centre' | 'surface' | 'mean' | 'depth', thetaTarget: number): number {
  const value = (fo: number) => {
    const e = exactTheta(shape, BI, fo);
    return point === 'depth' ? e.at(1 - DEPTH_M / LENGTH_M) : e[point];
  };
  let lo = 1e-6, hi = 10;
  for (let i = 0; i < 100; i++) {
    const mid = Math.sqrt(lo * hi);
    if (value(mid) > thetaTarget) lo = mid;
    else hi = mid;
  }
  return Math.sqrt(lo * hi);
}

describe('point-temperature end located inside a step', () => {
  const cases: [Shape1D, 'centre' | 'surface' | 'mean' | 'depth', number][] = [
    ['slab', 'centre', 500],
    ['cylinder', 'mean', 650],
    ['sphere', 'surface', 420],
    ['cylinder', 'depth', 600],
  ];
  for (const [shape, point, targetK] of cases) {
    it(`${shape}: ${point} to ${targetK} K ends on the target at the exact crossing time`, () => {
      const s = solved(
        solveFiniteVolumeStage(
          problemOf({
            shape,
            medium: convection(MEDIUM_K, H_W_PER_M2K),
            start: { kind: 'uniform', temperatureK: START_K },
            end: point === 'depth' ? { kind: 'point-temperature', point, depthM: DEPTH_M, temperatureK: targetK } : { kind: 'point-temperature', point, temperatureK: targetK },
            toleranceK: TOLERANCE_K,
            ...(point === 'depth' ? { depthM: DEPTH_M } : {}),
          }),
        ),
      );
      const got = lastOf(s, point);
      expect(Math.abs(got - targetK), `${shape} ${point}: end value ${got} K, target ${targetK} K, tolerance ${TOLERANCE_K} K`).toBeLessThan(TOLERANCE_K);
      // Time: the exact crossing, to within what the temperature tolerance allows at the local cooling rate.
      const exactS = (exactCrossingFo(shape, point, (targetK - MEDIUM_K) / SPAN_K) * LENGTH_M ** 2) / ALPHA_M2_PER_S;
      const curve = s.samples.temperaturesK[point] as Float64Array;
      const dt = s.samples.timeS[1] - s.samples.timeS[0];
      const rateKPerS = Math.abs(curve[curve.length - 1] - curve[curve.length - 2]) / dt;
      const timeToleranceS = (2 * TOLERANCE_K) / rateKPerS;
      expect(Math.abs(s.durationS - exactS), `${shape} ${point}: end at ${s.durationS} s, exact crossing ${exactS} s, tolerance ${timeToleranceS} s`).toBeLessThan(timeToleranceS);
    });
  }
});

describe('targets that cannot be met', () => {
  const cooling = (targetK: number, extra: Partial<Parameters<typeof problemOf>[0]> = {}) =>
    solveFiniteVolumeStage(problemOf({ shape: 'slab', medium: convection(MEDIUM_K, H_W_PER_M2K), start: { kind: 'uniform', temperatureK: START_K }, end: { kind: 'point-temperature', point: 'centre', temperatureK: targetK }, ...extra }));

  it('below the medium (convection only): target-unreachable', () => {
    const r = cooling(MEDIUM_K - 20);
    expect(r.ok ? 'ok' : r.code).toBe('target-unreachable');
    if (!r.ok) expect(r.message).toContain('280.00 K');
  });
  it('equal to the medium: target-unreachable (approached, never reached)', () => {
    const r = cooling(MEDIUM_K);
    expect(r.ok ? 'ok' : r.code).toBe('target-unreachable');
    if (!r.ok) expect(r.message).toMatch(/equal to the medium/);
  });
  it('above the start when cooling: target-unreachable', () => {
    const r = cooling(START_K + 50);
    expect(r.ok ? 'ok' : r.code).toBe('target-unreachable');
  });
  it('between the medium and cold surroundings but beyond where the part settles: target-not-reached', () => {
    // Medium 300 K, surroundings 200 K: the part settles between them (fluxOut = 0), above 230 K for this h.
    const r = solveFiniteVolumeStage(
      problemOf({
        shape: 'sphere',
        lengthM: 0.01,
        medium: { name: 'cold room', temperature: 300, heatTransfer: { kind: 'constant', hWPerM2K: 50 }, radiation: { emissivity: 0.9, surroundingsTemperature: 200 } },
        start: { kind: 'uniform', temperatureK: 400 },
        end: { kind: 'point-temperature', point: 'mean', temperatureK: 230 },
      }),
    );
    expect(r.ok ? 'ok' : r.code).toBe('target-not-reached');
    if (!r.ok) expect(r.message).toMatch(/settles/);
  });
  it('an aborted signal stops the stage: aborted', () => {
    const controller = new AbortController();
    controller.abort();
    const r = cooling(500, { signal: controller.signal });
    expect(r.ok ? 'ok' : r.code).toBe('aborted');
  });
  it('a finite shape: not-applicable', () => {
    const p = problemOf({ shape: 'slab', medium: convection(MEDIUM_K, H_W_PER_M2K), start: { kind: 'uniform', temperatureK: START_K }, end: { kind: 'duration', seconds: 10 } });
    const r = solveFiniteVolumeStage({ ...p, geometry: geometryOf({ kind: 'short-cylinder', radiusM: 0.02, halfLengthM: 0.03 }) });
    expect(r.ok ? 'ok' : r.code).toBe('not-applicable');
  });
});
