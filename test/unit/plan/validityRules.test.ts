// Each validity rule trips on the numbers it names and stays quiet otherwise.
import { describe, expect, it } from 'vitest';
import { stageWarnings, LUMPED_BIOT_LIMIT, RADIATION_SHARE_LIMIT } from '@/engine/validity/rules';
import type { StageFacts } from '@/engine/validity/stageFacts';

const quiet: StageFacts = {
  stageIndex: 0, method: 'series', forced: false, methodValid: true, methodInvalidReason: null,
  biotLumped: 0.05, biotSeries: 0.1, fourierEnd: 0.5, durationS: 100, hWPerM2K: 50, hIsConstant: true,
  radiationIncluded: false, radiationCoefficientWPerM2K: 1, emissivityUsed: 0.8, surfaceStartK: 400, mediumK: 300,
  liquidBath: false, surfaceRangeK: { lowK: 320, highK: 400 }, constantProperties: true, propertyTemperatureK: 350,
  propertyVariation: { conductivity: 0.05, heatCapacity: 0.05 }, lumpedErrorK: null, lumpedAccuracyLimitK: 5,
  oneTermErrorK: null, crossCheck: { method: 'finite-volume', refined: false, maxDifferenceK: 0.005, allowedK: 0.02 },
  energyRelativeError: 1e-10, timeSteps: null, endKind: 'duration',
};
const ids = (f: Partial<StageFacts>) => stageWarnings({ ...quiet, ...f }).map((w) => w.ruleId);

describe('validity rules', () => {
  it('say nothing about a stage inside every range', () => expect(ids({})).toEqual([]));

  it('flag lumped capacitance at Bi(Lc) = 0.1 or above (common practice limit)', () => {
    expect(ids({ method: 'lumped', biotLumped: LUMPED_BIOT_LIMIT })).toContain('lumped-biot-limit');
    expect(ids({ method: 'lumped', biotLumped: 0.099, lumpedErrorK: 1 })).not.toContain('lumped-biot-limit');
  });

  it('flag radiation left out when h_r exceeds 10% of h, with the numbers', () => {
    const w = stageWarnings({ ...quiet, radiationCoefficientWPerM2K: 80, hWPerM2K: 10, surfaceStartK: 1123.15 });
    const r = w.find((x) => x.ruleId === 'radiation-left-out')!;
    expect(r.numbers).toEqual({ radiationCoefficientWPerM2K: 80, hWPerM2K: 10, emissivity: 0.8 });
    expect(r.message).toMatch(/850 °C/);
    expect(ids({ radiationCoefficientWPerM2K: RADIATION_SHARE_LIMIT * 50 * 0.99 })).not.toContain('radiation-left-out');
  });

  it('flag constant properties that vary more than 20% over the stage', () => {
    expect(ids({ propertyVariation: { conductivity: 0.35, heatCapacity: 0.1 } })).toContain('constant-properties-vary');
    expect(ids({ constantProperties: false, propertyVariation: { conductivity: 0.35, heatCapacity: 0.1 } })).not.toContain('constant-properties-vary');
  });

  it('flag a constant h in a liquid bath through the boiling range', () => {
    expect(ids({ liquidBath: true, hWPerM2K: 2000, surfaceRangeK: { lowK: 330, highK: 1100 } })).toContain('constant-h-in-boiling-range');
    expect(ids({ liquidBath: true, hIsConstant: false, surfaceRangeK: { lowK: 330, highK: 1100 } })).not.toContain('constant-h-in-boiling-range');
  });

  it('flag an end condition met within the first step, and a cross-check beyond its allowance', () => {
    expect(ids({ endKind: 'point-temperature', durationS: 0 })).toContain('end-within-one-step');
    expect(ids({ crossCheck: { method: 'finite-volume', refined: false, maxDifferenceK: 0.5, allowedK: 0.02 } })).toContain('cross-check-difference');
  });

  it('advise by the kind of cross-check: a refined re-run gives the uncertainty, a second method says which to force', () => {
    const advice = (f: Partial<StageFacts>) => stageWarnings({ ...quiet, ...f }).find((w) => w.ruleId === 'cross-check-difference')!.advice;
    const refined = advice({ method: 'finite-volume', constantProperties: false, crossCheck: { method: 'finite-volume', refined: true, maxDifferenceK: 10.6, allowedK: 0.02 } });
    expect(refined).toMatch(/uncertain by about 11 K/);
    expect(refined).not.toMatch(/force|boiling/);
    expect(advice({ method: 'finite-volume', hIsConstant: false, crossCheck: { method: 'finite-volume', refined: true, maxDifferenceK: 10.6, allowedK: 0.02 } })).toMatch(/film collapse/);
    expect(advice({ crossCheck: { method: 'finite-volume', refined: false, maxDifferenceK: 0.5, allowedK: 0.02 } })).toMatch(/force the finite-volume method/);
  });

  it('flag the one-term hand method below Fo = 0.2 (common practice)', () => {
    expect(ids({ fourierEnd: 0.1 })).toContain('one-term-fourier-limit');
  });
});
