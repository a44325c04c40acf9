// CSV export and the variant comparison on results from the real engine (runPlan), for the demo
// pin of test/unit/exchange/demoDocument.ts (constant properties, so the energy balance is exact).
import { describe, expect, it } from 'vitest';
import { runPlan } from '@/engine/plan/runPlan';
import { planResultToCsv } from '@/features/exchange/planResultToCsv';
import { compareVariants } from '@/features/variants/compareVariants';
import { bathVariantK, demoPlanK } from './demoDocument';

const air = runPlan(demoPlanK);
const bath = runPlan(bathVariantK);

/** The CSV writes 0.001 K; the engine's end-condition tolerance is 0.01 K (StageProblem.toleranceK default). */
const CSV_ROUNDING_K = 0.0005;
const END_TOLERANCE_K = 0.01 + CSV_ROUNDING_K;
/** Stored-energy balance against the engine's heat removed: its methods keep energy to well under 0.5 %. */
const ENERGY_RELATIVE_TOLERANCE = 0.005;

describe('CSV of a real result', () => {
  it('the engine computed both plans', () => {
    expect(air.failure, JSON.stringify(air.failure)).toBeNull();
    expect(bath.failure, JSON.stringify(bath.failure)).toBeNull();
  });

  it('one row per sample, values equal to the result curves to the written precision', () => {
    const lines = planResultToCsv(air, { temperatureUnit: 'K' }).trimEnd().split('\r\n');
    const header = lines[0].split(',');
    const samples = air.stages.reduce((n, s) => n + s.curves.timeS.length, 0);
    expect(lines).toHaveLength(1 + samples);
    let row = 1;
    for (const stage of air.stages) {
      stage.curves.timeS.forEach((t, i) => {
        const cells = lines[row++].split(',');
        expect(Number(cells[0])).toBeCloseTo(t, 3);
        for (const id of ['centre', 'surface', 'mean'] as const) {
          const column = header.findIndex((h) => h.startsWith(id));
          const got = Number(cells[column]);
          const want = stage.curves.temperaturesK[id]![i];
          expect(Math.abs(got - want), `stage ${stage.index + 1} ${id} at t = ${t} s: got ${got}, expected ${want}, tolerance ${CSV_ROUNDING_K}`).toBeLessThanOrEqual(CSV_ROUNDING_K);
        }
      });
    }
  });

  it('starts at the initial 850 degC and the hold ends where its end condition says (centre 600 degC)', () => {
    const lines = planResultToCsv(air, { temperatureUnit: 'degC' }).trimEnd().split('\r\n');
    expect(lines[1].split(',').slice(4).map(Number)).toEqual([850, 850, 850]);
    const lastCentreC = Number(lines.at(-1)!.split(',')[4]);
    expect(Math.abs(lastCentreC - 600), `got ${lastCentreC} degC, expected 600 degC, tolerance ${END_TOLERANCE_K} K`).toBeLessThanOrEqual(END_TOLERANCE_K);
  });
});

describe('comparison of real results', () => {
  const [a, b] = compareVariants([
    { id: 'main', name: 'still air hold', result: air },
    { id: 'v1', name: 'liquid bath', result: bath },
  ]).plans;

  it('the bath reaches its lower target far sooner than still air reaches its higher one', () => {
    expect(a.computed!.stages[0].durationS).toBe(20);
    expect(b.computed!.stages[0].durationS).toBe(20);
    expect(b.computed!.stages[1].durationS).toBeLessThan(a.computed!.stages[1].durationS / 5);
    expect(b.computed!.maxSurfaceCoolingRateKPerS).toBeGreaterThan(a.computed!.maxSurfaceCoolingRateKPerS * 5);
  });

  it.each([
    ['still air hold', () => a, () => air],
    ['liquid bath', () => b, () => bath],
  ])('%s: heat removed equals the drop in stored energy, rho c V (T0 - mean end) (Incropera et al., 6th ed., Eq. 1.11a, from memory)', (_name, row, result) => {
    const r = result();
    const c = row().computed!;
    const rhoCpJPerM3K = 7850 * 480;
    const stored = rhoCpJPerM3K * r.geometry.volumeM3 * (demoPlanK.initialTemperature - c.endMeanK!);
    const relative = Math.abs(c.heatRemovedJ - stored) / stored;
    expect(relative, `heat removed ${c.heatRemovedJ} J, stored-energy drop ${stored} J (T0 ${demoPlanK.initialTemperature} K, mean end ${c.endMeanK} K), tolerance ${ENERGY_RELATIVE_TOLERANCE}`).toBeLessThanOrEqual(ENERGY_RELATIVE_TOLERANCE);
    expect(c.endCentreK).toBeCloseTo(r.stages.at(-1)!.endK.centre!, 12);
  });
});
