import { describe, expect, it } from 'vitest';
import { firstCrossingFo, type CrossingQuery } from '@/engine/methods/series/firstCrossingFo';

// Synthetic point curves with known crossings (sums of decaying exponentials, the form every series point takes).
function query(value: (fo: number) => number, over: Partial<CrossingQuery> = {}): CrossingQuery {
  return {
    value,
    envelope: (fo) => 400 * Math.exp(-fo) + 300 * Math.exp(-10 * fo),
    startK: value(0),
    targetK: 500,
    mediumK: 300,
    toleranceK: 0.01,
    monotone: false,
    foFloor: 1e-7,
    foMax: 1e4,
    secondsPerFo: 100,
    pointLabel: 'surface',
    ...over,
  };
}

describe('firstCrossingFo', () => {
  it('finds the first of two crossings of a rebounding curve (rise, then fall) to machine precision', () => {
    // T = 300 + 400 e^-Fo - 300 e^-10Fo: starts at 400 K, rises above 500 K, then falls to 300 K.
    const value = (fo: number) => 300 + 400 * Math.exp(-fo) - 300 * Math.exp(-10 * fo);
    const out = firstCrossingFo(query(value));
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    // Independent: bisection on the rising branch [0, Fo_peak], Fo_peak = ln(7.5)/9 from dT/dFo = 0.
    let lo = 0;
    let hi = Math.log(7.5) / 9;
    for (let i = 0; i < 100; i++) { const m = 0.5 * (lo + hi); if (value(m) < 500) lo = m; else hi = m; }
    expect(Math.abs(out.fo - lo) / lo, `found ${out.fo}, bisection ${lo}`).toBeLessThan(1e-12);
  });

  it('says why when a non-monotone curve never gets there (envelope horizon), or is beyond the longest stage', () => {
    const value = (fo: number) => 300 + 400 * Math.exp(-fo) - 300 * Math.exp(-10 * fo);
    const never = firstCrossingFo(query(value, { targetK: 700 }));
    expect(never.ok).toBe(false);
    if (!never.ok) {
      expect(never.code).toBe('target-unreachable');
      expect(never.message).toMatch(/beyond what the field can reach/);
    }
    const slow = firstCrossingFo(query((fo) => 300 + 400 * Math.exp(-1e-6 * fo), { targetK: 350, monotone: true, envelope: (fo) => 400 * Math.exp(-1e-6 * fo) }));
    expect(slow.ok).toBe(false);
    if (!slow.ok) expect(slow.code, slow.message).toBe('target-not-reached');
  });

  it('a crossing below the series floor is not-applicable, with the floor in the message', () => {
    const value = (fo: number) => 300 + 400 * Math.exp(-1e8 * fo);
    const out = firstCrossingFo(query(value, { targetK: 650, monotone: true, foFloor: 1e-7 }));
    expect(out.ok).toBe(false);
    if (!out.ok) {
      expect(out.code).toBe('not-applicable');
      expect(out.message).toMatch(/1\.00e-7/);
    }
  });
});
