// The charts keep the earlier result object only when every drawn number is the same.
import { describe, expect, it } from 'vitest';
import { drawsTheSame } from '@/app/useSameCurvesResult';
import { quenchedShaftResult } from '../../components/fixtures/quenchedShaftResult';

const copy = () => structuredClone(quenchedShaftResult);

describe('drawsTheSame', () => {
  it('a deep copy with other non-drawn facts (warnings, cross-check) draws the same', () => {
    const b = copy();
    b.stages[1].warnings = [];
    b.stages[1].crossCheck = null;
    expect(drawsTheSame(quenchedShaftResult, b)).toBe(true);
  });

  it.each([
    ['one curve sample', (r: typeof quenchedShaftResult) => (r.stages[2].curves.temperaturesK.centre![5] += 1e-9)],
    ['one time sample', (r: typeof quenchedShaftResult) => (r.stages[0].curves.timeS[3] += 1e-9)],
    ['one end-profile value', (r: typeof quenchedShaftResult) => (r.stages[1].endProfile.temperatureK[0] += 1e-9)],
    ['a stage name', (r: typeof quenchedShaftResult) => (r.stages[1].name = 'renamed')],
    ['a duration', (r: typeof quenchedShaftResult) => (r.stages[1].durationS += 1)],
    ['a stage fewer', (r: typeof quenchedShaftResult) => r.stages.pop()],
  ])('a change of %s draws differently', (_, change) => {
    const b = copy();
    change(b);
    expect(drawsTheSame(quenchedShaftResult, b)).toBe(false);
  });
});
