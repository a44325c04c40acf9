// The plan runner end to end: chaining, method selection, cross-check and warnings on real numbers.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { runPlan } from '@/engine/plan/runPlan';
import { parsePlan } from '@/schema/parsePlan';
import type { PlanK, Stage } from '@/schema/planSchema';
import demo from '@/library/plans/demo-plan.json';

const C = (c: number) => c + 273.15;

function plate(stages: Stage[], over: Partial<PlanK> = {}): PlanK {
  const raw = JSON.parse(readFileSync('test/fixtures/plans/minimal-plate.json', 'utf8'));
  const parsed = parsePlan(raw);
  if (!parsed.ok) throw new Error('fixture must parse');
  return { ...parsed.plan, stages, ...over };
}

const bath = (hWPerM2K: number, end: Stage['end'], method: Stage['method'] = 'auto'): Stage => ({
  name: `h ${hWPerM2K}`,
  medium: { name: 'bath', temperature: C(20), heatTransfer: { kind: 'constant', hWPerM2K } },
  end,
  method,
});

describe('runPlan chaining', () => {
  // Bi = h L / k = 4000 * 0.01 / 40 = 1: the series is the exact method (constant properties).
  const one = runPlan(plate([bath(4000, { kind: 'duration', seconds: 80 })]));
  const two = runPlan(plate([bath(4000, { kind: 'duration', seconds: 30 }), bath(4000, { kind: 'duration', seconds: 50 })]));

  it('uses the exact series for a constant-property plate at Bi = 1', () => {
    expect(one.stages[0].method).toBe('series');
    expect(one.stages[0].biot.series.value).toBeCloseTo(1, 12);
    expect(one.stages[0].biot.lumped.value).toBeCloseTo(1, 12); // plate: Lc = V/As = L
  });

  it('two stages in the same medium equal one stage of the summed duration (exact projection)', () => {
    for (const p of ['centre', 'surface', 'mean'] as const) {
      expect(Math.abs(two.stages[1].endK[p]! - one.stages[0].endK[p]!), p).toBeLessThan(1e-6);
    }
    expect(two.totalDurationS).toBe(80);
  });

  it('starts each stage from the profile the previous stage left', () => {
    const [a, b] = two.stages;
    expect(b.startK).toEqual(a.endK);
    expect(b.startK.centre! - b.startK.surface!).toBeGreaterThan(10);
    expect(b.startTimeS).toBe(30);
    expect(b.curves.timeS[0]).toBe(30);
  });

  it('cross-checks the series with the finite-volume solver within twice the 0.01 K tolerance', () => {
    const x = one.stages[0].crossCheck!;
    expect(x.method).toBe('finite-volume');
    expect(x.maxDifferenceK).toBeLessThan(0.02);
    expect(one.stages[0].warnings.map((w) => w.ruleId)).not.toContain('cross-check-difference');
  });

  it('gives the same stage results without the cross-check at the same tolerance', () => {
    const quick = runPlan(plate([bath(4000, { kind: 'duration', seconds: 80 })]), { crossCheck: false, toleranceK: 0.01 });
    expect(quick.crossChecked).toBe(false);
    expect(quick.stages[0].crossCheck).toBeNull();
    expect(quick.stages[0].endK).toEqual(one.stages[0].endK);
    expect(one.crossChecked).toBe(true);
    expect(one.toleranceK).toBe(0.01);
  });

  it('solves a quick pass to the quick tolerance, within it of the full pass', () => {
    const quick = runPlan(plate([bath(4000, { kind: 'duration', seconds: 80 })]), { crossCheck: false });
    expect(quick.toleranceK).toBe(0.1);
    for (const p of ['centre', 'surface', 'mean'] as const) expect(Math.abs(quick.stages[0].endK[p]! - one.stages[0].endK[p]!)).toBeLessThan(0.1);
  });

  it('accounts heat removed as rho c V (mean drop), per m² of face for a plate', () => {
    const s = one.stages[0];
    const expected = 7800 * 460 * 0.02 * (s.startK.mean! - s.endK.mean!);
    expect(Math.abs(s.heatRemovedJ - expected) / expected).toBeLessThan(1e-9);
    expect(s.heatBasis).toBe('per m² of cooled face');
  });
});

describe('runPlan method rules and warnings', () => {
  it('computes a forced lumped stage at Bi = 1 and warns with the rule', () => {
    const r = runPlan(plate([bath(4000, { kind: 'duration', seconds: 30 }, 'lumped')]));
    const s = r.stages[0];
    expect(s.method).toBe('lumped');
    expect(s.forced).toBe(true);
    const ids = s.warnings.map((w) => w.ruleId);
    expect(ids).toContain('forced-method-outside-range');
    expect(ids).toContain('lumped-biot-limit');
    expect(ids).toContain('cross-check-difference');
  });

  it('warns that radiation matters for a hot part in air with radiation left out', () => {
    const r = runPlan(plate([bath(15, { kind: 'duration', seconds: 20 })], { initialTemperature: C(850) }));
    const w = r.stages[0].warnings.find((x) => x.ruleId === 'radiation-left-out');
    expect(w).toBeDefined();
    // h_r = eps sigma (Ts + Tsur)(Ts² + Tsur²) at 850 °C and 20 °C, eps 0.8 (oxidised steel, common practice),
    // sigma from CODATA 2018 (Incropera et al., 6th ed., Eq. 1.9, from memory): 86.57 W/m²K by hand.
    expect(w!.numbers.radiationCoefficientWPerM2K).toBeCloseTo(86.57, 2);
    expect(w!.numbers.emissivity).toBe(0.8);
  });

  it('reports a target on the far side of the medium as not reachable, with a reason', () => {
    const r = runPlan(plate([bath(200, { kind: 'point-temperature', point: 'centre', temperature: C(10) })]));
    expect(r.stages).toHaveLength(0);
    expect(r.failure?.code).toBe('target-unreachable');
    expect(r.failure?.message).toMatch(/medium/);
  });

  it('locates a centre target to the tolerance', () => {
    const r = runPlan(plate([bath(4000, { kind: 'point-temperature', point: 'centre', temperature: C(100) })]));
    expect(Math.abs(r.stages[0].endK.centre! - C(100))).toBeLessThan(0.01);
  });
});

describe('the demo plan', () => {
  const parsed = parsePlan(demo);
  if (!parsed.ok) throw new Error('demo must parse');
  const r = runPlan(parsed.plan);

  it('runs all three stages', () => {
    expect(r.failure).toBeNull();
    expect(r.stages.map((s) => s.name)).toEqual(parsed.plan.stages.map((s) => s.name));
  });

  it('uses the finite-volume solver for the boiling-curve quench and says why', () => {
    const q = r.stages[1];
    expect(q.method).toBe('finite-volume');
    expect(q.methodReason).toMatch(/h depends on the surface temperature/);
    expect(q.energyRelativeError!).toBeLessThan(1e-6);
    expect(Math.abs(q.endK.centre! - C(200))).toBeLessThan(0.01);
  });

  it('reports both Biot numbers with their lengths', () => {
    const b = r.stages[0].biot;
    expect(b.lumped.lengthM).toBeCloseTo(0.01, 12); // Lc = r0/2 for a long cylinder
    expect(b.series.lengthM).toBeCloseTo(0.02, 12);
    expect(b.series.value / b.lumped.value).toBeCloseTo(2, 9);
  });

  it('carries the mean to its target in the hold', () => {
    expect(Math.abs(r.stages[2].endK.mean! - C(60))).toBeLessThan(0.01);
  });
});

describe('runPlan fallback', () => {
  it('hands a stage the series declines (below its Fourier floor) to the finite-volume solver and says so', () => {
    // 1 µs at Bi = 1 on a 10 mm half-thickness: Fo = alpha t / L² ≈ 1.1e-7, below the series' 5000-term floor.
    const r = runPlan(plate([bath(4000, { kind: 'duration', seconds: 1e-6 })]));
    expect(r.failure).toBeNull();
    expect(r.stages[0].method).toBe('finite-volume');
    expect(r.stages[0].methodReason).toMatch(/series declined/);
  });
});
