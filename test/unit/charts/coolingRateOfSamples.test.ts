// The display derivative on curves whose rate is known in closed form.
// Exponential decay T = T_inf + dT exp(-t/tau) has cooling rate (T - T_inf)/tau exactly.
// Truncation error of three-point differences: h²/6 |T'''| centred, h²/3 |T'''| one-sided
// (Fornberg, Mathematics of Computation 51 (1988) 699-706; any numerical-analysis text) (from memory).
import { describe, expect, it } from 'vitest';
import { coolingRateOfSamples } from '@/features/charts/coolingRateOfSamples';

const T_INF_K = 333.15;
const DELTA_K = 800;
const TAU_S = 40;
const exact = (t: number) => T_INF_K + DELTA_K * Math.exp(-t / TAU_S);
const exactRate = (t: number) => (DELTA_K / TAU_S) * Math.exp(-t / TAU_S);
/** |T'''| = dT / tau³ exp(-t/tau); bounded on [t-h, t+h] by its value at t-h. */
const thirdDerivativeBound = (t: number, h: number) => (DELTA_K / TAU_S ** 3) * Math.exp(-(t - h) / TAU_S);
/** Float round-off on differences of ~1000 K values over h: 1e-13 K / h, far below the truncation bound. */
const ROUND_OFF_K_PER_S = 1e-9;

function evenTimes(n: number, durationS: number): number[] {
  return Array.from({ length: n }, (_, i) => (i / (n - 1)) * durationS);
}

describe('coolingRateOfSamples', () => {
  it('matches the exact rate of an exponential decay within the three-point truncation bound', () => {
    const t = evenTimes(61, 120);
    const h = t[1] - t[0];
    const rates = coolingRateOfSamples(t, t.map(exact));
    t.forEach((ti, i) => {
      const endPoint = i === 0 || i === t.length - 1;
      const bound = (endPoint ? h ** 2 / 3 : h ** 2 / 6) * thirdDerivativeBound(ti, 2 * h) + ROUND_OFF_K_PER_S;
      const diff = Math.abs(rates[i] - exactRate(ti));
      expect(diff, `t = ${ti} s, h = ${h} s: got ${rates[i]}, expected ${exactRate(ti)}, |diff| ${diff}, bound ${bound}`).toBeLessThanOrEqual(bound);
    });
  });

  it('is second order: halving the spacing cuts the largest error about fourfold', () => {
    const largestError = (n: number) => {
      const t = evenTimes(n, 120);
      const rates = coolingRateOfSamples(t, t.map(exact));
      return Math.max(...t.map((ti, i) => Math.abs(rates[i] - exactRate(ti))));
    };
    const ratio = largestError(31) / largestError(61);
    // Second order gives 4; a first-order formula would give 2.
    expect(ratio, `error ratio coarse/fine = ${ratio}, expected 4 ± 0.6`).toBeGreaterThan(3.4);
    expect(ratio).toBeLessThan(4.6);
  });

  it('is exact on a parabola over uneven times (three-point differences fit any parabola)', () => {
    const t = [0, 0.7, 1.1, 2.9, 3.0, 5.5];
    const T = t.map((x) => 1100 - 30 * x + 1.5 * x * x);
    const rates = coolingRateOfSamples(t, T);
    t.forEach((x, i) => {
      const expected = 30 - 3 * x;
      expect(Math.abs(rates[i] - expected), `t = ${x}: got ${rates[i]}, expected ${expected}`).toBeLessThan(1e-9);
    });
  });

  it('a heating curve gives negative cooling rates; two samples give their slope; one gives NaN', () => {
    expect(coolingRateOfSamples([0, 10], [300, 320])).toEqual([-2, -2]);
    expect(coolingRateOfSamples([0], [300])[0]).toBeNaN();
  });
});
