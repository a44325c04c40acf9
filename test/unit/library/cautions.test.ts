import { describe, expect, it } from 'vitest';
import { STAGE_SHEET_CAUTIONS } from '@/library/cautions';

describe('stage-sheet cautions', () => {
  const all = STAGE_SHEET_CAUTIONS.map((c) => c.text).join(' ');

  it('have unique ids and non-empty text', () => {
    expect(new Set(STAGE_SHEET_CAUTIONS.map((c) => c.id)).size).toBe(STAGE_SHEET_CAUTIONS.length);
    for (const c of STAGE_SHEET_CAUTIONS) expect(c.text.length, c.id).toBeGreaterThan(40);
  });

  it.each([
    ['hot parts and burns', /hot/],
    ['quench-oil fire and flash point', /flash point/],
    ['steam from water quenches', /steam/],
    ['cracking and distortion', /crack[\s\S]*distort/],
    ['handling and lifting', /lifting/],
    ['deferring to site procedures, local codes and qualified people', /site procedures, local codes and the advice of qualified people/],
  ])('cover %s', (_topic, pattern) => {
    expect(all).toMatch(pattern);
  });

  it('say not to fight an oil fire with water', () => {
    expect(all).toMatch(/never water/);
  });
});
