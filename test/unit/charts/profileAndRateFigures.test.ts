// The profile and cooling-rate figures from a hand-built result.
import { describe, expect, it } from 'vitest';
import type { ScatterData } from 'plotly.js';
import { profileFigure } from '@/features/charts/profileFigure';
import { coolingRateFigure } from '@/features/charts/coolingRateFigure';
import { planChartTargets } from '@/features/charts/planChartTargets';
import type { PlanK } from '@/schema/planSchema';
import { quenchedShaftResult as result } from '../../components/fixtures/quenchedShaftResult';

const DISPLAY_TOL = 1e-9;

describe('profileFigure', () => {
  it('draws each stage end profile against distance from the axis, mm in SI', () => {
    const figure = profileFigure(result, { system: 'si' });
    const data = figure.data as Partial<ScatterData>[];
    expect(data.map((d) => d.name)).toEqual(['end of 1 transfer in air (20 s)', 'end of 2 oil quench (3 min 23 s)', 'end of 3 air hold (13 min 23 s)']);
    expect((data[1].x as number[]).map((v) => Number(v.toFixed(9)))).toEqual([0, 6.25, 12.5, 18.75, 25]);
    expect(Math.abs((data[1].y as number[])[4] - 112.4)).toBeLessThan(DISPLAY_TOL);
    expect((figure.layout.xaxis?.title as { text: string }).text).toBe('Distance from axis (mm)');
  });
  it('uses inches in US units (25 mm = 0.984252 in, 1 in = 2.54E-02 m, NIST SP 811 B.8)', () => {
    const data = profileFigure(result, { system: 'us', stageIndices: [1] }).data as Partial<ScatterData>[];
    expect(data.length).toBe(1);
    expect(Math.abs((data[0].x as number[])[4] - 0.025 / 0.0254)).toBeLessThan(DISPLAY_TOL);
  });
});

describe('coolingRateFigure', () => {
  const data = coolingRateFigure(result, { system: 'si' }).data as Partial<ScatterData>[];
  it('draws centre and surface, with a break between stages', () => {
    expect(data.map((d) => d.name)).toEqual(['axis', 'surface']);
    const x = data[1].x as (number | null)[];
    expect(x.length).toBe(3 * 41 + 2);
    expect(x[41]).toBeNull();
    expect(x[83]).toBeNull();
  });
  it('the quench-start surface rate follows the fixture curve: (845.9 - 60) / 60 s = 13.1 K/s', () => {
    // The fixture's quench surface curve is 60 + 785.9 exp(-t / 60 s) °C; three-point error at its start
    // is below h²/3 |T'''| = (4.5625²/3)(785.9/60³) = 0.025 K/s.
    const got = (data[1].x as number[])[42];
    const expected = 785.9 / 60;
    expect(Math.abs(got - expected), `got ${got}, expected ${expected}`).toBeLessThan(0.03);
    expect(Math.abs((data[1].y as number[])[42] - 845.9)).toBeLessThan(DISPLAY_TOL);
  });
});

describe('planChartTargets', () => {
  it('keeps point-temperature ends, with the depth where given', () => {
    const medium = { name: 'oil', temperature: 333.15, heatTransfer: { kind: 'constant' as const, hWPerM2K: 1500 } };
    const plan = {
      stages: [
        { name: 'a', medium, end: { kind: 'duration', seconds: 20 }, method: 'auto' },
        { name: 'b', medium, end: { kind: 'point-temperature', point: 'depth', depthM: 0.005, temperature: 423.15 }, method: 'auto' },
      ],
    } as unknown as PlanK;
    expect(planChartTargets(plan)).toEqual([{ stageIndex: 1, point: 'depth', depthM: 0.005, temperatureK: 423.15 }]);
  });
});
