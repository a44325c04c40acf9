// Method selection: the order the trade uses (lumped if the part is at one temperature, the exact
// series if everything is constant, a numerical solution otherwise), with reasons carrying numbers.
import { describe, expect, it } from 'vitest';
import { selectMethod, type MethodEligibility } from '@/engine/plan/selectMethod';

const base: MethodEligibility = { biotLumped: 0.02, lumpedErrorK: 1, lumpedAccuracyLimitK: 10, constantProperties: true, hIsConstant: true, radiation: false };

describe('selectMethod', () => {
  it('picks lumped capacitance when Bi(Lc) < 0.1 (common practice) and its missed spread is within the limit', () => {
    const s = selectMethod(base, 'auto');
    expect(s.method).toBe('lumped');
    expect(s.reason).toMatch(/0\.02 < 0\.1/);
    expect(s.crossCheck).toEqual({ method: 'series', refined: false });
  });

  it('refuses lumped when Bi(Lc) < 0.1 but the spread it ignores exceeds the limit', () => {
    const s = selectMethod({ ...base, lumpedErrorK: 25 }, 'auto');
    expect(s.method).toBe('series');
    expect(s.verdicts[0]).toMatchObject({ method: 'lumped', valid: false });
    expect(s.verdicts[0].reason).toMatch(/25 K exceeds the 10 K/);
  });

  it('picks the exact series when everything is constant and Bi(Lc) >= 0.1', () => {
    const s = selectMethod({ ...base, biotLumped: 0.4 }, 'auto');
    expect(s.method).toBe('series');
    expect(s.crossCheck).toEqual({ method: 'finite-volume', refined: false });
  });

  it.each([
    ['temperature-dependent properties', { constantProperties: false }, /properties depend on temperature/],
    ['a boiling curve', { hIsConstant: false }, /h depends on the surface temperature/],
    ['radiation', { radiation: true }, /includes radiation/],
  ])('falls back to finite volume with %s and says why', (_label, over, why) => {
    const s = selectMethod({ ...base, biotLumped: 0.4, ...over }, 'auto');
    expect(s.method).toBe('finite-volume');
    expect(s.reason).toMatch(why);
    expect(s.crossCheck).toEqual({ method: 'finite-volume', refined: true });
  });

  it('computes a forced method outside its range and says so', () => {
    const s = selectMethod({ ...base, biotLumped: 0.8 }, 'lumped');
    expect(s.method).toBe('lumped');
    expect(s.forced).toBe(true);
    expect(s.reason).toMatch(/OUTSIDE its range/);
  });
});
