// The whole-plan temperature figure from a hand-built result: what is drawn where, in which units.
// Unit conversions themselves are checked against NIST SP 811 in test/unit/units.
import { describe, expect, it } from 'vitest';
import type { ScatterData, Shape, Annotations } from 'plotly.js';
import { temperatureHistoryFigure } from '@/features/charts/temperatureHistoryFigure';
import { stageLabelRows, stageLabelWidthFraction } from '@/features/charts/stageLabelRows';
import { suggestedTimeAxis } from '@/features/charts/suggestedTimeAxis';
import { quenchedShaftResult as result } from '../../components/fixtures/quenchedShaftResult';

const DISPLAY_TOL = 1e-9;
const traces = (f: ReturnType<typeof temperatureHistoryFigure>) => f.data as Partial<ScatterData>[];

describe('temperatureHistoryFigure', () => {
  const targets = [{ stageIndex: 1, point: 'centre' as const, temperatureK: 150 + 273.15 }];
  const figure = temperatureHistoryFigure(result, { system: 'si', targets, extraSeries: [{ name: 'variant: warmer oil', timeS: [0, 400], temperatureK: [1123.15, 500] }] });

  it('draws one trace per reported point, then the target, then the extra series', () => {
    expect(traces(figure).map((t) => t.name)).toEqual(['axis', 'surface', 'volume mean', 'stage targets', 'variant: warmer oil']);
  });

  it('puts time in minutes for an 802.5 s plan and temperature in °C', () => {
    const axis = traces(figure)[0];
    const x = axis.x as number[];
    const y = axis.y as number[];
    expect(x.length).toBe(3 * 41);
    expect(Math.abs(x[x.length - 1] - 802.5 / 60)).toBeLessThan(DISPLAY_TOL);
    expect(Math.abs(y[0] - 850)).toBeLessThan(DISPLAY_TOL);
    expect((figure.layout.xaxis?.title as { text: string }).text).toBe('Time (min)');
    expect((figure.layout.yaxis?.title as { text: string }).text).toBe('Temperature (°C)');
  });

  it('draws the target over its stage at its temperature', () => {
    const target = traces(figure)[3];
    expect(target.x).toEqual([20 / 60, 202.5 / 60]);
    expect((target.y as number[]).map((v) => Number(v.toFixed(9)))).toEqual([150, 150]);
    expect((target.text as string[])[0]).toBe('target: axis 150.0 °C (2 oil quench)');
  });

  it('marks the stage boundaries and names every stage', () => {
    const lines = (figure.layout.shapes as Partial<Shape>[]).filter((s) => s.type === 'line').map((s) => s.x0);
    expect(lines).toEqual([20 / 60, 202.5 / 60]);
    expect((figure.layout.annotations as Partial<Annotations>[]).map((a) => a.text)).toEqual(['1 transfer in air', '2 oil quench', '3 air hold']);
  });

  it('shows °F on the axis and in the readout in US units (850 °C = 1562 °F, NIST SP 811 B.9)', () => {
    const us = temperatureHistoryFigure(result, { system: 'us' });
    const axis = traces(us)[0];
    expect(Math.abs((axis.y as number[])[0] - 1562)).toBeLessThan(1e-9);
    expect((axis.text as string[])[0]).toBe('axis: 1562.0 °F<br>0 s · 1 transfer in air');
    expect((us.layout.yaxis?.title as { text: string }).text).toBe('Temperature (°F)');
  });

  it('tells traces apart by dash and marker, not colour alone', () => {
    const styles = traces(figure).slice(0, 3).map((t) => `${t.line?.dash}/${t.marker?.symbol}`);
    expect(new Set(styles).size).toBe(3);
  });
});

describe('stageLabelRows', () => {
  it('lifts the name of a stage that starts before the previous name ends, and reuses free rows', () => {
    // Names 16 % of the width wide, starting at 0, 2.5 %, 25 %, 27 % and 60 % across.
    expect(stageLabelRows([0, 0.025, 0.25, 0.27, 0.6], [0.16, 0.16, 0.16, 0.16, 0.16])).toEqual([0, 1, 0, 1, 0]);
  });
  it('a name of 14 characters takes (14 × 6.5 + 10) / 600 of the width', () => {
    expect(stageLabelWidthFraction('2 oil quench12')).toBeCloseTo(101 / 600, 12);
  });
  it('on a log axis the names spread with the stages', () => {
    const figure = temperatureHistoryFigure(result, { system: 'si', timeAxis: 'log' });
    expect(figure.layout.xaxis?.type).toBe('log');
    const first = (figure.layout.annotations as Partial<Annotations>[])[1];
    // Annotations sit at log10 of the axis value: the quench starts at 20 s = 1/3 min.
    expect(first.x).toBeCloseTo(Math.log10(20 / 60), 12);
  });
  it('the fixture plan: the quench starts 2.5 % in, so its name goes one row up', () => {
    const figure = temperatureHistoryFigure(result, { system: 'si' });
    expect((figure.layout.annotations as Partial<Annotations>[]).map((a) => a.yshift)).toEqual([0, 14, 0]);
  });
});

describe('a plan that stopped', () => {
  it('marks where the computed stages end and names the stage that was not computed', () => {
    const stopped = { ...result, stages: result.stages.slice(0, 2), failure: { index: 2, name: 'air hold', code: 'target-unreachable', message: 'cannot reach' } };
    const figure = temperatureHistoryFigure(stopped, { system: 'si' });
    const last = (figure.layout.annotations as Partial<Annotations>[]).at(-1);
    expect(last?.text).toBe('stage 3 (air hold) not computed ▸');
    expect(last?.x).toBe(202.5 / 60);
  });
});

describe('finite shapes', () => {
  it('draws every reported point, corner and edge included, each with its own dash and marker', () => {
    const points = [
      { id: 'centre' as const, label: 'centre' },
      { id: 'face-x' as const, label: 'face ⟂ x, middle' },
      { id: 'edge' as const, label: 'edge along x (the longest side), middle' },
      { id: 'corner' as const, label: 'corner' },
      { id: 'mean' as const, label: 'volume mean' },
    ];
    const stages = result.stages.map((s) => ({
      ...s,
      curves: { timeS: s.curves.timeS, temperaturesK: { centre: s.curves.temperaturesK.centre, 'face-x': s.curves.temperaturesK.surface, edge: s.curves.temperaturesK.surface, corner: s.curves.temperaturesK.surface, mean: s.curves.temperaturesK.mean } },
    }));
    const data = traces(temperatureHistoryFigure({ ...result, points, stages }, { system: 'si' }));
    expect(data.map((t) => t.name)).toEqual(points.map((p) => p.label));
    expect(new Set(data.map((t) => `${t.line?.dash}/${t.marker?.symbol}`)).size).toBe(points.length);
  });
});

describe('suggestedTimeAxis', () => {
  it('log when a stage is under 5 % of the plan (fixture: 20 s of 802.5 s = 2.5 %), linear otherwise', () => {
    expect(suggestedTimeAxis(result)).toBe('log');
    expect(suggestedTimeAxis({ ...result, stages: result.stages.slice(1), totalDurationS: 782.5 })).toBe('linear'); // 182.5 s of 782.5 s = 23 %
    expect(suggestedTimeAxis({ ...result, stages: result.stages.slice(0, 1), totalDurationS: 20 })).toBe('linear');
  });
});

describe('targets on a log time axis', () => {
  it('start at the first sampled time after 0, not at 0 (which a log axis cannot show)', () => {
    const figure = temperatureHistoryFigure(result, { system: 'si', timeAxis: 'log', targets: [{ stageIndex: 0, point: 'surface', temperatureK: 1100 }] });
    const target = traces(figure).find((t) => t.name === 'stage targets');
    // The fixture's first positive sample is 20 s / 40 = 0.5 s.
    expect(target?.x).toEqual([0.5 / 60, 20 / 60]);
  });
});
