import { describe, expect, it } from 'vitest';
import type { Field, Series1DField } from '@/engine/fields';
import { geometryOf } from '@/engine/geometry/geometry';
import type { StageOutcome, StageSolution } from '@/engine/methods/stageProblem';
import type { Shape } from '@/schema/planSchema';
import { solveSeriesStage } from '@/engine/methods/series/solveSeriesStage';
import { uniformStartMeanTheta, uniformStartTheta } from '@/engine/methods/series/uniformStartSolution';
import { meanTemperature, temperatureAt } from '@/engine/methods/series/evaluateField1D';
import { stageProblem, type FixtureInput } from './stageFixture';

// Invented part and media (demo numbers): a steel-like solid quenched and held.
const K = 30;
const RHO = 7800;
const C = 500;
const ALPHA = K / (RHO * C);
const PLATE: Shape = { kind: 'plate', halfThicknessM: 0.02 };
const SHAPES: { shape: Shape; geometry: 'slab' | 'cylinder' | 'sphere'; lengthM: number }[] = [
  { shape: PLATE, geometry: 'slab', lengthM: 0.02 },
  { shape: { kind: 'long-cylinder', radiusM: 0.03 }, geometry: 'cylinder', lengthM: 0.03 },
  { shape: { kind: 'sphere', radiusM: 0.025 }, geometry: 'sphere', lengthM: 0.025 },
];
// The series reports to ~1e-9 of the start excess; 1e-6 K leaves room for rounding over 200 samples.
const SERIES_TOLERANCE_K = 1e-6;

function base(shape: Shape, start: Field, end: FixtureInput['end'], extra: Partial<FixtureInput> = {}) {
  return stageProblem({ shape, kWPerMK: K, rhoKgPerM3: RHO, cJPerKgK: C, hWPerM2K: 800, mediumK: 350, start, end, ...extra });
}

function solved(outcome: StageOutcome): StageSolution {
  if (!outcome.ok) throw new Error(`${outcome.code}: ${outcome.message}`);
  return outcome.solution;
}

function seriesEnd(s: StageSolution): Series1DField {
  if (s.endField.kind !== 'series-1d') throw new Error(`end field is ${s.endField.kind}, not series-1d`);
  return s.endField;
}

describe('solveSeriesStage', () => {
  it('uniform start, duration: every sample equals the uniform-start series; depth point; heat; energy check; one-term note', () => {
    for (const { shape, geometry, lengthM } of SHAPES) {
      const bi = (800 * lengthM) / K;
      const s = solved(solveSeriesStage(base(shape, { kind: 'uniform', temperatureK: 1100 }, { kind: 'duration', seconds: 120 }, { depthM: 0.004 })));
      expect(s.durationS).toBe(120);
      expect(s.samples.timeS.length).toBe(201);
      for (const k of [0, 1, 7, 100, 200]) {
        const fo = (ALPHA * s.samples.timeS[k]) / lengthM ** 2;
        const expected = {
          centre: 350 + 750 * uniformStartTheta(geometry, bi, 0, fo),
          surface: 350 + 750 * uniformStartTheta(geometry, bi, 1, fo),
          mean: 350 + 750 * uniformStartMeanTheta(geometry, bi, fo),
          depth: 350 + 750 * uniformStartTheta(geometry, bi, 1 - 0.004 / lengthM, fo),
        };
        for (const id of ['centre', 'surface', 'mean', 'depth'] as const) {
          const got = (s.samples.temperaturesK[id] as Float64Array)[k];
          expect(Math.abs(got - expected[id]), `${geometry} ${id} t=${s.samples.timeS[k]}: got ${got}, expected ${expected[id]}, tol ${SERIES_TOLERANCE_K}`).toBeLessThan(SERIES_TOLERANCE_K);
        }
      }
      const meanEnd = (s.samples.temperaturesK.mean as Float64Array)[200];
      const V = geometryOf(shape).volumeM3;
      expect(Math.abs(s.heatRemovedJ - RHO * C * V * (1100 - meanEnd)) / s.heatRemovedJ, `${geometry} heat`).toBeLessThan(1e-9);
      // Surface heat summed over the sampling terms only: its tail is O(2 Bi / (N pi)^3), ~1e-6 here.
      const ENERGY_TOLERANCE = 1e-5;
      expect(s.energyRelativeError as number, `${geometry} energy error ${s.energyRelativeError}, tol ${ENERGY_TOLERANCE}`).toBeLessThan(ENERGY_TOLERANCE);
      expect(Math.abs(meanTemperature(seriesEnd(s)) - meanEnd), `${geometry} end field mean`).toBeLessThan(SERIES_TOLERANCE_K);
      expect(Math.abs(temperatureAt(seriesEnd(s), 0) - (s.samples.temperaturesK.centre as Float64Array)[200])).toBeLessThan(SERIES_TOLERANCE_K);
      expect(s.effort.terms as number).toBeGreaterThan(1);
      // 120 s is Fo = 0.92 (plate) .. 0.41 (cylinder): the one-term error is reported for Fo > 0.2 and is small.
      const note = s.notes.find((n) => n.kind === 'one-term-error');
      expect(note, `${geometry} one-term note`).toBeDefined();
      expect(note!.centreK, `${geometry} one-term centre error ${note!.centreK} K`).toBeLessThan(0.02 * 750);
      expect(note!.centreK).toBeGreaterThan(0);
    }
  });

  it('chaining: two stages in the same medium equal one stage of the summed duration', () => {
    const CHAIN_TOLERANCE_K = 1e-6;
    for (const { shape, geometry } of SHAPES) {
      const first = solved(solveSeriesStage(base(shape, { kind: 'uniform', temperatureK: 1100 }, { kind: 'duration', seconds: 15 })));
      const second = solved(solveSeriesStage(base(shape, first.endField, { kind: 'duration', seconds: 45 })));
      const whole = solved(solveSeriesStage(base(shape, { kind: 'uniform', temperatureK: 1100 }, { kind: 'duration', seconds: 60 })));
      for (const id of ['centre', 'surface', 'mean'] as const) {
        const a = (second.samples.temperaturesK[id] as Float64Array)[200];
        const b = (whole.samples.temperaturesK[id] as Float64Array)[200];
        expect(Math.abs(a - b), `${geometry} ${id}: chained ${a}, single ${b}, tol ${CHAIN_TOLERANCE_K}`).toBeLessThan(CHAIN_TOLERANCE_K);
        // The second stage starts where the first ended.
        expect(Math.abs((second.samples.temperaturesK[id] as Float64Array)[0] - (first.samples.temperaturesK[id] as Float64Array)[200])).toBeLessThan(CHAIN_TOLERANCE_K);
      }
      expect(Math.abs(first.heatRemovedJ + second.heatRemovedJ - whole.heatRemovedJ) / whole.heatRemovedJ, `${geometry} heat adds up`).toBeLessThan(1e-9);
      expect(second.notes.length, 'no one-term note for a non-uniform start').toBe(0);
    }
  });

  it('chaining into another medium: the series start and the same field sampled on a fine grid agree', () => {
    // Grid of 4001 nodes: linear interpolation error ~ h^2/8 T'' ~ 1e-4 K here.
    const GRID_ROUTE_TOLERANCE_K = 2e-3;
    for (const { shape, geometry, lengthM } of SHAPES) {
      const quench = solved(solveSeriesStage(base(shape, { kind: 'uniform', temperatureK: 1100 }, { kind: 'duration', seconds: 10 }, { hWPerM2K: 3000 })));
      const nodes = Float64Array.from({ length: 4001 }, (_, i) => (i / 4000) * lengthM);
      const grid: Field = { kind: 'grid-1d', geometry, lengthM, nodesM: nodes, temperaturesK: Float64Array.from(nodes, (x) => temperatureAt(seriesEnd(quench), x)) };
      const hold = { hWPerM2K: 15, mediumK: 300 };
      const fromSeries = solved(solveSeriesStage(base(shape, quench.endField, { kind: 'duration', seconds: 30 }, hold)));
      const fromGrid = solved(solveSeriesStage(base(shape, grid, { kind: 'duration', seconds: 30 }, hold)));
      for (const id of ['centre', 'surface', 'mean'] as const) {
        for (const k of [1, 50, 200]) {
          const a = (fromSeries.samples.temperaturesK[id] as Float64Array)[k];
          const b = (fromGrid.samples.temperaturesK[id] as Float64Array)[k];
          expect(Math.abs(a - b), `${geometry} ${id} k=${k}: series start ${a}, grid start ${b}`).toBeLessThan(GRID_ROUTE_TOLERANCE_K);
        }
      }
      // Held in still air the surface warms up from the core: the curve is not monotone.
      const surface = fromSeries.samples.temperaturesK.surface as Float64Array;
      expect(surface[10] > surface[0], `${geometry} surface rebounds: ${surface[0]} -> ${surface[10]}`).toBe(true);
    }
  });

  it('time to target: the centre reaches the target at the time found by independent bisection', () => {
    for (const { shape, geometry, lengthM } of SHAPES) {
      const target = 600;
      const s = solved(solveSeriesStage(base(shape, { kind: 'uniform', temperatureK: 1100 }, { kind: 'point-temperature', point: 'centre', temperatureK: target })));
      const centre = s.samples.temperaturesK.centre as Float64Array;
      expect(Math.abs(centre[centre.length - 1] - target), `${geometry} end centre ${centre[centre.length - 1]}`).toBeLessThan(1e-6);
      // Bisection in t on the uniform-start series, 80 halvings (Burden & Faires, 9th ed., Sec. 2.1, from memory).
      const bi = (800 * lengthM) / K;
      let lo = 0;
      let hi = 1e5;
      for (let i = 0; i < 80; i++) {
        const mid = 0.5 * (lo + hi);
        if (350 + 750 * uniformStartTheta(geometry, bi, 0, (ALPHA * mid) / lengthM ** 2) > target) lo = mid;
        else hi = mid;
      }
      expect(Math.abs(s.durationS - lo) / lo, `${geometry}: solver ${s.durationS} s, bisection ${lo} s`).toBeLessThan(1e-9);
    }
  });

  it('time to target from a non-uniform start finds the first crossing of a rising surface', () => {
    const quench = solved(solveSeriesStage(base(PLATE, { kind: 'uniform', temperatureK: 1100 }, { kind: 'duration', seconds: 10 }, { hWPerM2K: 3000 })));
    const hold = { hWPerM2K: 15, mediumK: 300 };
    const rebound = solved(solveSeriesStage(base(PLATE, quench.endField, { kind: 'duration', seconds: 60 }, { ...hold, sampleCount: 2001 })));
    const surface = rebound.samples.temperaturesK.surface as Float64Array;
    const start = surface[0];
    const target = start + 0.5 * (Math.max(...surface) - start);
    const firstIndex = surface.findIndex((t) => t >= target);
    const s = solved(solveSeriesStage(base(PLATE, quench.endField, { kind: 'point-temperature', point: 'surface', temperatureK: target }, hold)));
    const dt = 60 / 2000;
    expect(s.durationS, `first crossing ${s.durationS} s vs dense samples between ${(firstIndex - 1) * dt} and ${firstIndex * dt} s`).toBeGreaterThan((firstIndex - 1) * dt);
    expect(s.durationS).toBeLessThanOrEqual(firstIndex * dt);
  });

  it('unreachable targets give the right code and a sentence saying why', () => {
    const uniform: Field = { kind: 'uniform', temperatureK: 1100 };
    const cases: { target: number; code: string; words: RegExp }[] = [
      { target: 350, code: 'target-unreachable', words: /equals the medium temperature.*asymptotically/ },
      { target: 340, code: 'target-unreachable', words: /far side of the medium temperature/ },
      { target: 1200, code: 'target-unreachable', words: /beyond what the field can reach/ },
      { target: 1100, code: 'target-unreachable', words: /already starts at the target/ },
    ];
    for (const { target, code, words } of cases) {
      const out = solveSeriesStage(base(PLATE, uniform, { kind: 'point-temperature', point: 'mean', temperatureK: target }));
      expect(out.ok, `target ${target}`).toBe(false);
      if (!out.ok) {
        expect(out.code, `target ${target}: ${out.message}`).toBe(code);
        expect(out.message).toMatch(words);
      }
    }
    // Reachable only after more than 1e8 s: a nearly insulated thick part.
    const slow = solveSeriesStage(base({ kind: 'sphere', radiusM: 0.5 }, uniform, { kind: 'point-temperature', point: 'centre', temperatureK: 351 }, { hWPerM2K: 1e-3 }));
    expect(slow.ok).toBe(false);
    if (!slow.ok) expect(slow.code, slow.message).toBe('target-not-reached');
  });

  it('is not applicable to radiation, h(T) tables and finite shapes', () => {
    const uniform: Field = { kind: 'uniform', temperatureK: 1100 };
    const end = { kind: 'duration' as const, seconds: 10 };
    const outs = [
      solveSeriesStage(base(PLATE, uniform, end, { radiation: { emissivity: 0.8 } })),
      solveSeriesStage(base(PLATE, uniform, end, { hWPerM2K: { rows: [[300, 500], [1200, 900]] } })),
      solveSeriesStage(base({ kind: 'bar', halfWidthM: 0.02, halfHeightM: 0.03 }, uniform, end)),
    ];
    for (const out of outs) {
      expect(out.ok).toBe(false);
      if (!out.ok) expect(out.code, out.message).toBe('not-applicable');
    }
  });
});

describe('solveSeriesStage, edge cases', () => {
  it('insulated-back plate of thickness L equals the symmetric plate of half-thickness L; heat per m² on V = L', () => {
    const start: Field = { kind: 'uniform', temperatureK: 1000 };
    const end = { kind: 'duration' as const, seconds: 200 };
    const back = solved(solveSeriesStage(base({ kind: 'plate-insulated-back', thicknessM: 0.015 }, start, end)));
    const sym = solved(solveSeriesStage(base({ kind: 'plate', halfThicknessM: 0.015 }, start, end)));
    expect((back.samples.temperaturesK.centre as Float64Array)[200]).toBeCloseTo((sym.samples.temperaturesK.centre as Float64Array)[200], 10);
    expect(back.heatRemovedJ / sym.heatRemovedJ, 'one cooled face: half the heat of the two-faced plate').toBeCloseTo(0.5, 12);
  });

  it('Bi = 1e-6 (nearly insulated) and Bi = 1e5 (surface held at the medium) stay finite and physical', () => {
    const start: Field = { kind: 'uniform', temperatureK: 1000 };
    for (const { shape } of SHAPES) {
      const tiny = solved(solveSeriesStage(base(shape, start, { kind: 'duration', seconds: 3600 }, { hWPerM2K: 1e-3 })));
      const lumped = 350 + 650 * Math.exp(-(1e-3 * geometryOf(shape).cooledAreaM2 * 3600) / (RHO * C * geometryOf(shape).volumeM3));
      expect(Math.abs((tiny.samples.temperaturesK.mean as Float64Array)[200] - lumped), `${shape.kind} tiny Bi vs lumped`).toBeLessThan(1e-6);
      const huge = solved(solveSeriesStage(base(shape, start, { kind: 'duration', seconds: 60 }, { hWPerM2K: 1e8 })));
      const surface = huge.samples.temperaturesK.surface as Float64Array;
      expect(Math.abs(surface[1] - 350), `${shape.kind} huge Bi surface at the first sample ${surface[1]}`).toBeLessThan(0.1);
      expect(Array.from(surface).every(Number.isFinite)).toBe(true);
    }
  });

  it('a depth named only by the end condition is reported and reached', () => {
    const s = solved(solveSeriesStage(base(PLATE, { kind: 'uniform', temperatureK: 1100 }, { kind: 'point-temperature', point: 'depth', depthM: 0.005, temperatureK: 700 })));
    const depth = s.samples.temperaturesK.depth as Float64Array;
    expect(Math.abs(depth[depth.length - 1] - 700), `depth at the end ${depth[depth.length - 1]}`).toBeLessThan(1e-6);
    const bi = (800 * 0.02) / K;
    const fo = (ALPHA * s.durationS) / 0.02 ** 2;
    expect(Math.abs(350 + 750 * uniformStartTheta('slab', bi, 0.75, fo) - 700)).toBeLessThan(1e-6);
  });

  it('refuses a start field of another shape or size with not-applicable (no throw)', () => {
    const grid: Field = { kind: 'grid-1d', geometry: 'cylinder', lengthM: 0.02, nodesM: Float64Array.of(0, 0.02), temperaturesK: Float64Array.of(900, 800) };
    const out = solveSeriesStage(base(PLATE, grid, { kind: 'duration', seconds: 10 }));
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.code, out.message).toBe('not-applicable');
  });

  it('a stage too short for the series floor is not-applicable, with the numbers', () => {
    const out = solveSeriesStage(base(PLATE, { kind: 'uniform', temperatureK: 1000 }, { kind: 'duration', seconds: 1e-6 }));
    expect(out.ok).toBe(false);
    if (!out.ok) {
      expect(out.code).toBe('not-applicable');
      expect(out.message).toMatch(/floor/);
    }
  });
});
