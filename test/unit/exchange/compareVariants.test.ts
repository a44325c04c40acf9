// The comparison table's figures come from the results: stage durations, totals, ends, extremes, heat.
import { describe, expect, it } from 'vitest';
import { compareVariants } from '@/features/variants/compareVariants';
import { airResult, bathResult } from './demoResult';

describe('compareVariants', () => {
  const table = compareVariants([
    { id: 'main', name: 'Air only', result: airResult },
    { id: 'v1', name: 'Air then bath', result: bathResult },
    { id: 'v2', name: 'Not run yet', result: undefined },
  ]);
  const [air, bath, pending] = table.plans;

  it('reads stage durations and methods per plan', () => {
    expect(air.computed?.stages).toEqual([
      { name: 'Transfer', durationS: 20, method: 'lumped' },
      { name: 'Hold, "still" air', durationS: 1800, method: 'series' },
    ]);
    expect(bath.computed?.stages.map((s) => s.method)).toEqual(['lumped', 'finite-volume']);
    expect(table.stageRowCount).toBe(2);
  });

  it('totals, end temperatures of the last stage, and the largest figures over the stages', () => {
    expect(air.computed).toMatchObject({ totalDurationS: 1820, endCentreK: 873.15, endSurfaceK: 870, endMeanK: 872, maxSurfaceCoolingRateKPerS: 2.5, maxCentreSurfaceDifferenceK: 6, heatRemovedJ: 1_550_000, methods: ['lumped', 'series'] });
    expect(bath.computed).toMatchObject({ totalDurationS: 115, endCentreK: 373.15, maxSurfaceCoolingRateKPerS: 42, maxCentreSurfaceDifferenceK: 310, heatRemovedJ: 3_250_000 });
  });

  it('a plan without a result is shown as pending, not as zeros', () => {
    expect(pending.computed).toBeNull();
  });

  it('a failed stage is carried in words', () => {
    const failed = { ...bathResult, stages: bathResult.stages.slice(0, 1), failure: { index: 1, name: 'Bath', code: 'target-unreachable', message: 'the centre cannot reach 20 °C in a 60 °C bath' } };
    const [row] = compareVariants([{ id: 'x', name: 'x', result: failed }]).plans;
    expect(row.computed?.failure).toBe('stage 2 (Bath): the centre cannot reach 20 °C in a 60 °C bath');
    expect(row.computed?.stages).toHaveLength(1);
  });
});

describe('variantOverlaySeries', () => {
  it('one series per variant and point, stages joined in time order, names tell them apart', async () => {
    const { variantOverlaySeries } = await import('@/features/variants/variantOverlaySeries');
    const series = variantOverlaySeries([
      { name: 'Air then bath', result: bathResult },
      { name: 'Pending', result: undefined },
    ]);
    expect(series.map((s) => s.name)).toEqual(['Air then bath · axis', 'Air then bath · surface']);
    expect(series[0].timeS).toEqual([0, 10, 20, 20, 60, 115]);
    expect(series[1].temperatureK).toEqual([1123.15, 1106, 1096, 1096, 420, 340]);
  });
});

describe('swapStageMedium', () => {
  it('puts a library liquid with its boiling curve into one stage only', async () => {
    const { swapStageMedium } = await import('@/features/variants/swapStageMedium');
    const { BUILT_IN_MEDIA } = await import('@/library/builtInLibrary');
    const { demoPlanK } = await import('./demoDocument');
    const liquid = BUILT_IN_MEDIA.find((m) => m.boilingCurve);
    if (!liquid) throw new Error('the library has no medium with a boiling curve');
    const out = swapStageMedium(demoPlanK, 1, liquid);
    if (!out.ok) throw new Error(out.message);
    expect(out.plan.stages[1].medium.libraryId).toBe(liquid.id);
    expect(out.plan.stages[1].medium.heatTransfer.kind).toBe('surface-table');
    // Library tables are in degC; the plan holds kelvin (+273.15, BIPM SI Brochure 9th ed.).
    const firstRow = out.plan.stages[1].medium.heatTransfer.kind === 'surface-table' ? out.plan.stages[1].medium.heatTransfer.rows[0] : null;
    expect(firstRow?.[0]).toBeCloseTo(liquid.boilingCurve!.hWPerM2KBySurfaceC[0][0] + 273.15, 9);
    expect(out.plan.stages[0]).toEqual(demoPlanK.stages[0]);
  });
});

describe('overlaidPoints', () => {
  it('keeps one pattern per series: centre and surface up to two variants, centre only beyond', async () => {
    const { overlaidPoints, variantOverlaySeries, DISTINCT_EXTRA_STYLES } = await import('@/features/variants/variantOverlaySeries');
    expect(overlaidPoints(2)).toEqual(['centre', 'surface']);
    expect(overlaidPoints(3)).toEqual(['centre']);
    const four = variantOverlaySeries(['a', 'b', 'c', 'd'].map((name) => ({ name, result: bathResult })));
    expect(four.map((s) => s.name)).toEqual(['a · axis', 'b · axis', 'c · axis', 'd · axis']);
    expect(four.length).toBeLessThanOrEqual(DISTINCT_EXTRA_STYLES);
  });
});
