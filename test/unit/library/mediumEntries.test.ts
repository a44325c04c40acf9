// Built-in media against named references: Incropera's Table 1.1 for air, the Grossmann quench
// severity table for liquids (through h = 2Hk), and the shape rules of a boiling curve.
import { describe, expect, it } from 'vitest';
import { BUILT_IN_MEDIA } from '@/library/builtInLibrary';
import type { MediumEntry } from '@/library/libraryEntrySchema';
import { agitatedOil } from '@/library/media/agitatedOil';
import { agitatedWater } from '@/library/media/agitatedWater';
import { brine } from '@/library/media/brine';
import { forcedAir } from '@/library/media/forcedAir';
import { polymerQuenchant } from '@/library/media/polymerQuenchant';
import { stillAir } from '@/library/media/stillAir';
import { stillOil } from '@/library/media/stillOil';
import { stillWater } from '@/library/media/stillWater';

const METRES_PER_INCH = 0.0254;
/** Steel conductivity over the quench range, W/m K, used to turn H into h: austenite to ferrite (BISRA 1953, from memory). */
const STEEL_K_LOW_W_PER_MK = 20;
const STEEL_K_HIGH_W_PER_MK = 40;
/** The entries round the converted band to 2-3 significant digits. */
const BAND_ROUNDING_REL_TOL = 0.02;

/**
 * Grossmann quench severity H, per inch, by agitation (ASM Handbook, Vol. 4, Heat Treating, 1991;
 * Totten, Bates and Clinton, Handbook of Quenchants and Quenching Technology, 1993; from memory).
 */
const GROSSMANN_H_PER_INCH: ReadonlyArray<readonly [MediumEntry, number, number, string]> = [
  [stillOil, 0.25, 0.3, 'oil, no agitation'],
  [agitatedOil, 0.35, 0.8, 'oil, moderate to strong agitation'],
  [stillWater, 0.9, 1.0, 'water, no agitation'],
  [agitatedWater, 1.2, 2.0, 'water, moderate to strong agitation'],
  [brine, 2.0, 2.2, 'brine, none to mild agitation'],
];

const rel = (got: number, expected: number) => Math.abs(got - expected) / expected;

describe('all media', () => {
  it.each(BUILT_IN_MEDIA.map((m) => [m.id, m] as const))('%s: suggested h and temperature lie inside their own ranges', (_id, m) => {
    expect(m.hWPerM2K.suggested, `${m.id} h ${JSON.stringify(m.hWPerM2K)}`).toBeGreaterThanOrEqual(m.hWPerM2K.min);
    expect(m.hWPerM2K.suggested, `${m.id} h ${JSON.stringify(m.hWPerM2K)}`).toBeLessThanOrEqual(m.hWPerM2K.max);
    expect(m.temperatureC.suggested).toBeGreaterThanOrEqual(m.temperatureC.min);
    expect(m.temperatureC.suggested).toBeLessThanOrEqual(m.temperatureC.max);
    // A range, not one false-precise number: the top is at least 1.5 times the bottom (common practice).
    expect(m.hWPerM2K.max / m.hWPerM2K.min, `${m.id} h range`).toBeGreaterThanOrEqual(1.5);
  });

  it('gases radiate; liquids carry a boiling curve', () => {
    for (const m of BUILT_IN_MEDIA) {
      expect(m.radiationMatters, m.id).toBe(m.phase === 'gas');
      expect(m.boilingCurve !== undefined, m.id).toBe(m.phase === 'liquid');
    }
  });

  it('the list runs from mild to severe by suggested h (Grossmann ordering, ASM Handbook Vol. 4, from memory)', () => {
    const hs = BUILT_IN_MEDIA.map((m) => m.hWPerM2K.suggested);
    hs.forEach((h, i) => i > 0 && expect(h, `${BUILT_IN_MEDIA[i].id} after ${BUILT_IN_MEDIA[i - 1].id}`).toBeGreaterThan(hs[i - 1]));
  });
});

describe('h ranges against named references', () => {
  it('still and forced air match Incropera Table 1.1 (free 2-25, forced 25-250 W/m2 K for gases, from memory)', () => {
    expect([stillAir.hWPerM2K.min, stillAir.hWPerM2K.max]).toEqual([2, 25]);
    expect([forcedAir.hWPerM2K.min, forcedAir.hWPerM2K.max]).toEqual([25, 250]);
  });

  it.each(GROSSMANN_H_PER_INCH.map(([m, lo, hi, what]) => [m.id, m, lo, hi, what] as const))(
    '%s: h range is 2Hk over the Grossmann band for %s and steel k of 20-40 W/m K',
    (_id, m, hLowPerInch, hHighPerInch) => {
      const expectedMin = (2 * hLowPerInch * STEEL_K_LOW_W_PER_MK) / METRES_PER_INCH;
      const expectedMax = (2 * hHighPerInch * STEEL_K_HIGH_W_PER_MK) / METRES_PER_INCH;
      const message = (end: string, got: number, expected: number) =>
        `${m.id} h ${end}: got ${got}, expected ${expected.toFixed(0)} +/- ${BAND_ROUNDING_REL_TOL * 100} % (H ${hLowPerInch}-${hHighPerInch} per inch, k ${STEEL_K_LOW_W_PER_MK}-${STEEL_K_HIGH_W_PER_MK} W/m K)`;
      expect(rel(m.hWPerM2K.min, expectedMin) <= BAND_ROUNDING_REL_TOL, message('min', m.hWPerM2K.min, expectedMin)).toBe(true);
      expect(rel(m.hWPerM2K.max, expectedMax) <= BAND_ROUNDING_REL_TOL, message('max', m.hWPerM2K.max, expectedMax)).toBe(true);
    },
  );

  it('the polymer quenchant lies between oil and water (Totten, Bates and Clinton 1993, from memory)', () => {
    expect(polymerQuenchant.hWPerM2K.suggested).toBeGreaterThan(stillOil.hWPerM2K.max);
    expect(polymerQuenchant.hWPerM2K.suggested).toBeLessThan(agitatedWater.hWPerM2K.suggested);
  });
});

describe('boiling curves', () => {
  const liquids = BUILT_IN_MEDIA.filter((m) => m.boilingCurve !== undefined);

  it.each(liquids.map((m) => [m.id, m] as const))('%s: labelled illustrative, starting at the bath it was drawn for', (_id, m) => {
    const curve = m.boilingCurve!;
    expect(curve.label).toMatch(/^Illustrative shape only, not measured data/);
    expect(curve.hWPerM2KBySurfaceC[0][0]).toBe(curve.drawnForBathC);
    expect(curve.drawnForBathC).toBe(m.temperatureC.suggested);
  });

  it.each(liquids.map((m) => [m.id, m] as const))('%s: film boiling low at high surface temperature, peak in nucleate boiling, convection near the bath', (_id, m) => {
    const curve = m.boilingCurve!;
    const rows = curve.hWPerM2KBySurfaceC;
    const peak = rows.reduce((best, r) => (r[1] > best[1] ? r : best));
    const where = `${m.id}: peak ${peak[1]} W/m2 K at ${peak[0]} degC, convection below ${curve.convectionBelowC}, film above ${curve.filmAboveC}`;
    expect(peak[0] > curve.convectionBelowC && peak[0] < curve.filmAboveC, where).toBe(true);
    // Film and convection regimes stay well under the peak: at most a third of it (common practice shape).
    for (const [t, h] of rows) if (t >= curve.filmAboveC || t <= curve.convectionBelowC) expect(h, `${where}; row ${t} degC`).toBeLessThanOrEqual(peak[1] / 3);
    // h rises from the film regime to the peak and falls from the peak to the bath: one hump.
    const i = rows.indexOf(peak);
    for (let j = 1; j <= i; j++) expect(rows[j][1], `${where}; rising to the peak at row ${j}`).toBeGreaterThanOrEqual(rows[j - 1][1]);
    for (let j = i + 1; j < rows.length; j++) expect(rows[j][1], `${where}; falling after the peak at row ${j}`).toBeLessThanOrEqual(rows[j - 1][1]);
  });

  it.each(liquids.map((m) => [m.id, m] as const))('%s: the constant-h range lies between the curve\'s lowest and highest h', (_id, m) => {
    const hs = m.boilingCurve!.hWPerM2KBySurfaceC.map((r) => r[1]);
    expect(m.hWPerM2K.min).toBeGreaterThanOrEqual(Math.min(...hs));
    expect(m.hWPerM2K.max).toBeLessThanOrEqual(Math.max(...hs));
  });

  it('water-based peaks lie in the boiling range of Incropera Table 1.1 (2500-100000 W/m2 K, from memory)', () => {
    for (const m of [stillWater, agitatedWater, brine, polymerQuenchant]) {
      const peak = Math.max(...m.boilingCurve!.hWPerM2KBySurfaceC.map((r) => r[1]));
      expect(peak >= 2500 && peak <= 100_000, `${m.id} peak ${peak}`).toBe(true);
    }
  });

  it('agitation shortens the vapour film: film boiling ends at a higher surface temperature', () => {
    expect(agitatedWater.boilingCurve!.filmAboveC).toBeGreaterThan(stillWater.boilingCurve!.filmAboveC);
    expect(agitatedOil.boilingCurve!.filmAboveC).toBeGreaterThan(stillOil.boilingCurve!.filmAboveC);
    expect(brine.boilingCurve!.filmAboveC).toBeGreaterThan(stillWater.boilingCurve!.filmAboveC);
  });
});

describe('medium cautions', () => {
  const text = (m: MediumEntry) => m.cautions.join(' ');
  it('oils warn of fire, flash point and water in the oil', () => {
    for (const m of [stillOil, agitatedOil]) {
      expect(text(m), m.id).toMatch(/flash point/);
      expect(text(m), m.id).toMatch(/ignite|fire/);
      expect(text(m), m.id).toMatch(/water/i);
    }
  });
  it('water-based media warn of steam and cracking; polymer of concentration; air of burns', () => {
    for (const m of [stillWater, agitatedWater, brine, polymerQuenchant]) {
      expect(text(m), m.id).toMatch(/steam/i);
      expect(text(m), m.id).toMatch(/crack/);
    }
    expect(text(polymerQuenchant)).toMatch(/concentration/);
    for (const m of [stillAir, forcedAir]) expect(text(m), m.id).toMatch(/hot/i);
  });
  it('every medium defers to site procedures, local codes and qualified people', () => {
    for (const m of BUILT_IN_MEDIA) expect(text(m), m.id).toMatch(/local codes/);
  });
});
