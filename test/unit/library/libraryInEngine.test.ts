// A library entry, converted to a plan and read back through the engine's property and surface
// models, gives the handbook value at the handbook temperature: the degC -> K step is in one place only.
import { describe, expect, it } from 'vitest';
import { materialModel } from '@/engine/properties/materialModel';
import { surfaceBoundary } from '@/engine/properties/surfaceBoundary';
import { materialFromLibrary, mediumFromLibrary } from '@/library/libraryToPlan';
import { plainCarbonSteel } from '@/library/materials/plainCarbonSteel';
import { stillAir } from '@/library/media/stillAir';
import { stillWater } from '@/library/media/stillWater';

/** Interpolation at a table row returns the row value up to float rounding. */
const ROW_VALUE_ABS_TOL = 1e-9;

describe('library data read through the engine', () => {
  it('steel k at 293.15 K is the 20 degC row, 51.9 W/m K (BISRA 1953, from memory)', () => {
    const model = materialModel(materialFromLibrary(plainCarbonSteel));
    expect(Math.abs(model.conductivity.at(293.15) - 51.9)).toBeLessThan(ROW_VALUE_ABS_TOL);
    expect(Math.abs(model.specificHeat.at(998.15) - 1432)).toBeLessThan(ROW_VALUE_ABS_TOL);
  });

  it('the still-water boiling curve gives its 300 degC row at 573.15 K and bath convection at 298.15 K', () => {
    const out = mediumFromLibrary(stillWater, { heatTransfer: 'boiling-curve' });
    if (!out.ok) throw new Error(out.message);
    const surface = surfaceBoundary(out.medium);
    expect(surface.mediumK).toBeCloseTo(298.15, 9);
    expect(Math.abs(surface.convectionCoefficient(573.15) - 15000)).toBeLessThan(ROW_VALUE_ABS_TOL);
    expect(Math.abs(surface.convectionCoefficient(298.15) - 700)).toBeLessThan(ROW_VALUE_ABS_TOL);
  });

  it('still air with radiation: flux at 500 degC surface equals h dT + eps sigma (Ts^4 - Tsur^4) (Incropera 6th ed., Eqs. 1.3a, 1.7)', () => {
    const out = mediumFromLibrary(stillAir, { material: plainCarbonSteel });
    if (!out.ok) throw new Error(out.message);
    const ts = 773.15;
    const tsur = 293.15;
    const sigma = 5.670374419e-8; // CODATA 2018
    const expected = 10 * (ts - tsur) + 0.8 * sigma * (ts ** 4 - tsur ** 4);
    const got = surfaceBoundary(out.medium).fluxOut(ts);
    expect(Math.abs(got - expected) / expected, `got ${got} W/m2, expected ${expected} W/m2`).toBeLessThan(1e-12);
  });
});
