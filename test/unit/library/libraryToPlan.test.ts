import { describe, expect, it } from 'vitest';
import { materialSchema, mediumSchema } from '@/schema/planSchema';
import { KELVIN_OFFSET } from '@/schema/planTemperatures';
import { BUILT_IN_MATERIALS, BUILT_IN_MEDIA } from '@/library/builtInLibrary';
import { materialFromLibrary, mediumFromLibrary } from '@/library/libraryToPlan';
import { plainCarbonSteel } from '@/library/materials/plainCarbonSteel';
import { stillAir } from '@/library/media/stillAir';
import { stillWater } from '@/library/media/stillWater';

/** degC -> K is exact to the 12 significant digits the conversion keeps. */
const KELVIN_SHIFT_TOLERANCE_K = 1e-9;

describe('materialFromLibrary', () => {
  it.each(BUILT_IN_MATERIALS.map((m) => [m.id, m] as const))('%s becomes a plan material that passes the plan schema', (_id, entry) => {
    const material = materialFromLibrary(entry);
    const parsed = materialSchema.safeParse(material);
    expect(parsed.success, `${entry.id}: ${parsed.error?.message}`).toBe(true);
    expect(material.libraryId).toBe(entry.id);
    expect(material.source).toBe(entry.source);
  });

  it('shifts table temperatures from degC to kelvin by 273.15 K (BIPM SI Brochure, 9th ed.) and keeps values', () => {
    const material = materialFromLibrary(plainCarbonSteel);
    const table = typeof material.conductivityWPerMK === 'number' ? [] : material.conductivityWPerMK.table;
    expect(table.length).toBe(plainCarbonSteel.conductivityWPerMK.length);
    table.forEach(([k, v], i) => {
      const [c, expected] = plainCarbonSteel.conductivityWPerMK[i];
      expect(Math.abs(k - (c + KELVIN_OFFSET)), `row ${i}: ${c} degC -> got ${k} K, expected ${c + KELVIN_OFFSET} K`).toBeLessThan(KELVIN_SHIFT_TOLERANCE_K);
      expect(v).toBe(expected);
    });
    expect(table[0][0]).toBe(293.15);
  });
});

describe('mediumFromLibrary', () => {
  it.each(BUILT_IN_MEDIA.map((m) => [m.id, m] as const))('%s with defaults passes the plan schema and is in kelvin', (_id, entry) => {
    const out = mediumFromLibrary(entry, { material: plainCarbonSteel });
    if (!out.ok) throw new Error(out.message);
    expect(mediumSchema.safeParse(out.medium).success).toBe(true);
    expect(out.medium.temperature).toBeCloseTo(entry.temperatureC.suggested + KELVIN_OFFSET, 9);
    expect(out.medium.heatTransfer).toEqual({ kind: 'constant', hWPerM2K: entry.hWPerM2K.suggested });
    expect(out.medium.libraryId).toBe(entry.id);
  });

  it('still air carries radiation with the material emissivity by default; it can be switched off', () => {
    const on = mediumFromLibrary(stillAir, { material: plainCarbonSteel });
    expect(on.ok && on.medium.radiation).toEqual({ emissivity: plainCarbonSteel.emissivity.suggested });
    const off = mediumFromLibrary(stillAir, { radiation: false });
    expect(off.ok && off.medium.radiation).toBeUndefined();
  });

  it('radiation without a known emissivity is refused with a sentence, not a guess', () => {
    const out = mediumFromLibrary(stillAir);
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.message).toMatch(/emissivity/);
  });

  it('the boiling-curve option gives a surface-table in kelvin that passes the plan schema', () => {
    const out = mediumFromLibrary(stillWater, { heatTransfer: 'boiling-curve', temperatureC: 40 });
    if (!out.ok) throw new Error(out.message);
    expect(mediumSchema.safeParse(out.medium).success).toBe(true);
    expect(out.medium.temperature).toBeCloseTo(313.15, 9);
    const ht = out.medium.heatTransfer;
    if (ht.kind !== 'surface-table') throw new Error(`expected a surface-table, got ${ht.kind}`);
    const curve = stillWater.boilingCurve!.hWPerM2KBySurfaceC;
    expect(ht.rows.map(([k]) => k)).toEqual(curve.map(([c]) => Number((c + KELVIN_OFFSET).toPrecision(12))));
    expect(ht.rows.map(([, h]) => h)).toEqual(curve.map(([, h]) => h));
  });

  it('asking a gas for a boiling curve is refused', () => {
    const out = mediumFromLibrary(stillAir, { heatTransfer: 'boiling-curve', radiation: false });
    expect(out.ok).toBe(false);
  });

  it('an explicit constant h is used as given', () => {
    const out = mediumFromLibrary(stillWater, { hWPerM2K: 2500 });
    expect(out.ok && out.medium.heatTransfer).toEqual({ kind: 'constant', hWPerM2K: 2500 });
  });
});
