// Built-in materials against property values from named references. Bands are wide where the
// entry is a different grade than the reference, tight where the entry copies the reference table.
import { describe, expect, it } from 'vitest';
import { BUILT_IN_MATERIALS } from '@/library/builtInLibrary';
import type { MaterialEntry } from '@/library/libraryEntrySchema';
import { aluminaCeramic } from '@/library/materials/aluminaCeramic';
import { aluminiumAlloy } from '@/library/materials/aluminiumAlloy';
import { austeniticStainlessSteel } from '@/library/materials/austeniticStainlessSteel';
import { LEAN_MEAT_COMPOSITION, leanMeatProduct } from '@/library/materials/leanMeatProduct';
import { lowAlloySteel } from '@/library/materials/lowAlloySteel';
import { plainCarbonSteel } from '@/library/materials/plainCarbonSteel';
import { pureCopper } from '@/library/materials/pureCopper';
import { sodaLimeGlass } from '@/library/materials/sodaLimeGlass';
import { interpolateTable } from '@/engine/numerics/interpolateTable';

type Rows = ReadonlyArray<readonly [number, number]>;
const at = (rows: Rows, tempC: number) =>
  interpolateTable(
    rows.map((r) => r[0]),
    rows.map((r) => r[1]),
    tempC,
  );

function expectWithin(what: string, got: number, low: number, high: number, reference: string) {
  expect(got >= low && got <= high, `${what}: got ${got}, expected ${low}..${high} (${reference})`).toBe(true);
}

function expectRelative(what: string, got: number, expected: number, relTol: number, reference: string) {
  const rel = Math.abs(got - expected) / expected;
  expect(rel <= relTol, `${what}: got ${got}, expected ${expected} +/- ${relTol * 100} % (${reference}); off by ${(rel * 100).toFixed(2)} %`).toBe(true);
}

const INCROPERA_A1 = 'Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1 (from memory)';
const INCROPERA_A2 = 'Incropera et al., 6th ed., Table A.2 (from memory)';
const INCROPERA_A3 = 'Incropera et al., 6th ed., Table A.3 (from memory)';
const ROOM_C = 26.85; // 300 K, the first row of the Incropera tables

/** Entry copies the reference table: only rounding and transcription slips are allowed. */
const TRANSCRIPTION_REL_TOL = 0.01;
/** Room-temperature diffusivity from the entry vs the one the reference tabulates for the same material. */
const SAME_MATERIAL_DIFFUSIVITY_REL_TOL = 0.03;
/** Different grade from the reference (0.2 % C steel vs Incropera's plain carbon steel): grades differ by up to this. */
const NEIGHBOUR_GRADE_DIFFUSIVITY_REL_TOL = 0.2;

describe('all materials', () => {
  it.each(BUILT_IN_MATERIALS.map((m) => [m.id, m] as const))('%s: tables rise in temperature and hold physically possible values', (_id, m) => {
    for (const [name, rows] of [
      ['k', m.conductivityWPerMK],
      ['rho', m.densityKgPerM3],
      ['cp', m.specificHeatJPerKgK],
    ] as const) {
      rows.forEach((r, i) => {
        if (i > 0) expect(r[0], `${m.id} ${name} row ${i}`).toBeGreaterThan(rows[i - 1][0]);
        expect(r[1], `${m.id} ${name} row ${i}`).toBeGreaterThan(0);
      });
    }
    // Known solids span about 0.03 (aerogels) to 2000 W/m K (diamond), 100-22600 kg/m3 and 100-5000 J/kg K:
    // Incropera et al., 6th ed., Fig. 2.4 and Tables A.1-A.3 (from memory).
    for (const [, k] of m.conductivityWPerMK) expectWithin(`${m.id} k`, k, 0.03, 2000, 'Incropera Fig. 2.4');
    for (const [, rho] of m.densityKgPerM3) expectWithin(`${m.id} rho`, rho, 100, 22600, 'Incropera Tables A.1-A.3');
    for (const [, cp] of m.specificHeatJPerKgK) expectWithin(`${m.id} cp`, cp, 100, 5000, 'Incropera Tables A.1-A.3');
  });

  // The food product is mostly water, whose expansion is far larger near 90 degC; the Choi-Okos check covers it.
  const solids = BUILT_IN_MATERIALS.filter((m) => m.id !== leanMeatProduct.id);
  it.each(solids.map((m) => [m.id, m] as const))('%s: density changes with temperature at a solid\'s expansion rate', (_id, m) => {
    // Volumetric expansion of solids lies below about 1e-4 per K (linear about 0-35e-6 per K),
    // ASM Handbook Vol. 2 and Incropera Appendix A (from memory); steels rise once where austenite forms.
    const rows = m.densityKgPerM3;
    for (let i = 1; i < rows.length; i++) {
      const beta = -(rows[i][1] - rows[i - 1][1]) / rows[i - 1][1] / (rows[i][0] - rows[i - 1][0]);
      const transformationStep = m.id.includes('steel') && m.id !== austeniticStainlessSteel.id && rows[i][0] >= 700 && rows[i][0] <= 900 && beta < 0;
      if (!transformationStep) expectWithin(`${m.id} volumetric expansion between ${rows[i - 1][0]} and ${rows[i][0]} degC (1/K)`, beta, 0, 1e-4, 'ASM Handbook Vol. 2 (from memory)');
    }
  });
});

describe('steels', () => {
  it('plain carbon steel at room temperature matches the plain carbon steel of Incropera Table A.1', () => {
    // Incropera Table A.1, plain carbon steel at 300 K: k 60.5, rho 7854, cp 434, alpha 17.7e-6 m2/s (from memory).
    expectWithin('k(20 degC)', at(plainCarbonSteel.conductivityWPerMK, 20), 45, 65, INCROPERA_A1);
    expectRelative('rho(20 degC)', at(plainCarbonSteel.densityKgPerM3, 20), 7854, 0.01, INCROPERA_A1);
    expectWithin('cp(20 degC)', at(plainCarbonSteel.specificHeatJPerKgK, 20), 420, 500, INCROPERA_A1);
    const alpha = at(plainCarbonSteel.conductivityWPerMK, ROOM_C) / (at(plainCarbonSteel.densityKgPerM3, ROOM_C) * at(plainCarbonSteel.specificHeatJPerKgK, ROOM_C));
    expectRelative('alpha(300 K) m2/s', alpha, 17.7e-6, NEIGHBOUR_GRADE_DIFFUSIVITY_REL_TOL, INCROPERA_A1);
  });

  it('plain carbon steel conductivity near 730 degC has fallen to about half its room value', () => {
    // Incropera Table A.1, plain carbon steel: 60.5 at 300 K, 30.0 at 1000 K, ratio 0.50 (from memory).
    const ratio = at(plainCarbonSteel.conductivityWPerMK, 726.85) / at(plainCarbonSteel.conductivityWPerMK, ROOM_C);
    expectWithin('k(1000 K)/k(300 K)', ratio, 0.45, 0.7, INCROPERA_A1);
  });

  it.each([
    [plainCarbonSteel.id, plainCarbonSteel],
    [lowAlloySteel.id, lowAlloySteel],
  ] as const)('%s: effective cp peaks in the transformation range and falls back in austenite', (_id, steel) => {
    const rows = steel.specificHeatJPerKgK;
    const peak = rows.reduce((best, r) => (r[1] > best[1] ? r : best));
    // Ac1 to Ac3 of hypoeutectoid steels lies at about 700-820 degC (ASM Handbook Vol. 4, from memory);
    // the brief puts the carbon-steel peak at roughly 700-780 degC.
    expectWithin(`${steel.id} cp peak temperature (degC)`, peak[0], 700, 790, 'ASM Handbook Vol. 4 (from memory)');
    // Incropera Table A.1, plain carbon steel: cp 1169 at 1000 K against 559 at 600 K, a ratio near 2 (from memory).
    expectWithin(`${steel.id} cp peak / cp(600 degC)`, peak[1] / at(rows, 600), 1.5, 2.5, INCROPERA_A1);
    // Austenite cp around 600-700 J/kg K, BISRA 1953 (from memory).
    expectWithin(`${steel.id} cp(1000 degC)`, at(rows, 1000), 580, 700, 'BISRA 1953 (from memory)');
    expect(steel.notes.join(' ')).toMatch(/effective heat capacity/);
    expect(steel.notes.join(' ')).toMatch(/martensite/);
    expect(steel.notes.join(' ')).toMatch(/not a transformation model/);
  });

  it('low-alloy steel conducts less than plain carbon steel at room temperature, about the same in austenite', () => {
    // Alloying lowers k of ferritic steels; in austenite the commercial steels converge near 25-30 W/m K, BISRA 1953 (from memory).
    expect(at(lowAlloySteel.conductivityWPerMK, 20)).toBeLessThan(at(plainCarbonSteel.conductivityWPerMK, 20));
    expectWithin('low-alloy k(20 degC)', at(lowAlloySteel.conductivityWPerMK, 20), 35, 48, 'ASM Handbook Vol. 1 (from memory)');
    for (const t of [900, 1000, 1100, 1200]) {
      expectRelative(`k(${t} degC) low-alloy vs carbon`, at(lowAlloySteel.conductivityWPerMK, t), at(plainCarbonSteel.conductivityWPerMK, t), 0.1, 'BISRA 1953 (from memory)');
    }
  });

  it('austenitic stainless steel copies Incropera Table A.1 AISI 304 and has no transformation peak', () => {
    // AISI 304 at 300 K: rho 7900, cp 477, k 14.9, alpha 3.95e-6 m2/s; at 1000 K: k 25.4, cp 611 (from memory).
    expectRelative('k(300 K)', at(austeniticStainlessSteel.conductivityWPerMK, ROOM_C), 14.9, TRANSCRIPTION_REL_TOL, INCROPERA_A1);
    expectRelative('k(1000 K)', at(austeniticStainlessSteel.conductivityWPerMK, 726.85), 25.4, TRANSCRIPTION_REL_TOL, INCROPERA_A1);
    expectRelative('cp(1000 K)', at(austeniticStainlessSteel.specificHeatJPerKgK, 726.85), 611, TRANSCRIPTION_REL_TOL, INCROPERA_A1);
    const alpha = 14.9 / (at(austeniticStainlessSteel.densityKgPerM3, ROOM_C) * at(austeniticStainlessSteel.specificHeatJPerKgK, ROOM_C));
    expectRelative('alpha(300 K) m2/s', alpha, 3.95e-6, SAME_MATERIAL_DIFFUSIVITY_REL_TOL, INCROPERA_A1);
    const cp = austeniticStainlessSteel.specificHeatJPerKgK;
    cp.forEach((r, i) => i > 0 && expect(r[1], `cp row ${i}`).toBeGreaterThan(cp[i - 1][1]));
  });
});

describe('non-ferrous, glass, ceramic', () => {
  it.each([
    // [entry, k, rho, cp, alpha at 300 K, reference] from the named Incropera tables (from memory)
    [aluminiumAlloy.id, aluminiumAlloy, 177, 2770, 875, 73.0e-6, INCROPERA_A1],
    [pureCopper.id, pureCopper, 401, 8933, 385, 117e-6, INCROPERA_A1],
    [aluminaCeramic.id, aluminaCeramic, 36.0, 3970, 765, 11.9e-6, INCROPERA_A2],
  ] as const)('%s at 300 K copies its reference table', (_id, m: MaterialEntry, k, rho, cp, alpha, reference) => {
    const gotK = at(m.conductivityWPerMK, ROOM_C);
    const gotRho = at(m.densityKgPerM3, ROOM_C);
    const gotCp = at(m.specificHeatJPerKgK, ROOM_C);
    expectRelative(`${m.id} k`, gotK, k, TRANSCRIPTION_REL_TOL, reference);
    expectRelative(`${m.id} rho`, gotRho, rho, TRANSCRIPTION_REL_TOL, reference);
    expectRelative(`${m.id} cp`, gotCp, cp, TRANSCRIPTION_REL_TOL, reference);
    expectRelative(`${m.id} alpha`, gotK / (gotRho * gotCp), alpha, SAME_MATERIAL_DIFFUSIVITY_REL_TOL, reference);
  });

  it('copper conducts near 400 W/m K at room temperature and loses under 20 % by 900 degC', () => {
    // Incropera Table A.1, pure copper: 401 at 300 K, 339 at 1200 K (from memory).
    expectWithin('copper k(20 degC)', at(pureCopper.conductivityWPerMK, 20), 385, 415, INCROPERA_A1);
    expectWithin('copper k(900 degC) / k(27 degC)', at(pureCopper.conductivityWPerMK, 900) / at(pureCopper.conductivityWPerMK, ROOM_C), 0.8, 0.9, INCROPERA_A1);
  });

  it('alumina conductivity falls steeply with temperature', () => {
    // Incropera Table A.2, polycrystalline aluminium oxide: 36.0 at 300 K, 7.85 at 1000 K (from memory).
    expectRelative('alumina k(1000 K)', at(aluminaCeramic.conductivityWPerMK, 726.85), 7.85, TRANSCRIPTION_REL_TOL, INCROPERA_A2);
  });

  it('soda-lime glass matches Incropera Table A.3 plate glass', () => {
    // Glass, plate (soda lime) at 300 K: rho 2500, k 1.4, cp 750, alpha 0.75e-6 m2/s (from memory).
    const k = at(sodaLimeGlass.conductivityWPerMK, ROOM_C);
    const rho = at(sodaLimeGlass.densityKgPerM3, ROOM_C);
    const cp = at(sodaLimeGlass.specificHeatJPerKgK, ROOM_C);
    expectRelative('glass k', k, 1.4, TRANSCRIPTION_REL_TOL, INCROPERA_A3);
    expectRelative('glass alpha', k / (rho * cp), 0.75e-6, SAME_MATERIAL_DIFFUSIVITY_REL_TOL, INCROPERA_A3);
    expect(sodaLimeGlass.notes.join(' ')).toMatch(/held constant/);
  });

  it('emissivities: bare aluminium low, oxidised steel high, glass and moist food near black', () => {
    // Incropera et al., 6th ed., Tables A.11 (metals) and A.12 (nonmetals) (from memory): polished aluminium about 0.04,
    // oxidised steel about 0.8, glass about 0.9, water 0.95.
    expect(aluminiumAlloy.emissivity.suggested).toBeLessThanOrEqual(0.2);
    expectWithin('oxidised steel emissivity', plainCarbonSteel.emissivity.suggested, 0.7, 0.9, 'Incropera Table A.11');
    expectWithin('glass emissivity', sodaLimeGlass.emissivity.suggested, 0.85, 0.95, 'Incropera Table A.12');
    expectWithin('food emissivity', leanMeatProduct.emissivity.suggested, 0.85, 0.97, 'Incropera Table A.12');
  });
});

describe('water-rich food product', () => {
  // Choi and Okos (1986) component correlations, T in degC, as reproduced in ASHRAE Handbook,
  // Refrigeration, Thermal Properties of Foods (from memory). [c0, c1, c2] of c0 + c1 T + c2 T^2.
  const CHOI_OKOS = {
    water: { k: [0.57109, 1.7625e-3, -6.7036e-6], cpKJ: [4.1762, -9.0864e-5, 5.4731e-6], rho: [997.18, 3.1439e-3, -3.7574e-3] },
    protein: { k: [0.17881, 1.1958e-3, -2.7178e-6], cpKJ: [2.0082, 1.2089e-3, -1.3129e-6], rho: [1329.9, -0.5184, 0] },
    fat: { k: [0.18071, -2.7604e-4, -1.7749e-7], cpKJ: [1.9842, 1.4733e-3, -4.8008e-6], rho: [925.59, -0.41757, 0] },
    ash: { k: [0.32962, 1.4011e-3, -2.9069e-6], cpKJ: [1.0926, 1.8896e-3, -3.6817e-6], rho: [2423.8, -0.28063, 0] },
  } as const;
  const poly = (c: readonly number[], t: number) => c[0] + c[1] * t + c[2] * t * t;
  const parts = Object.keys(LEAN_MEAT_COMPOSITION) as (keyof typeof LEAN_MEAT_COMPOSITION)[];
  /** The entry rounds to 3-4 significant digits. */
  const ROUNDING_REL_TOL = 0.002;

  function choiOkos(t: number) {
    // Density: ideal mixture 1/rho = sum(x_i/rho_i); cp: mass-fraction mean; k: parallel model with volume fractions.
    const specificVolume = parts.reduce((s, p) => s + LEAN_MEAT_COMPOSITION[p] / poly(CHOI_OKOS[p].rho, t), 0);
    const rho = 1 / specificVolume;
    const cp = 1000 * parts.reduce((s, p) => s + LEAN_MEAT_COMPOSITION[p] * poly(CHOI_OKOS[p].cpKJ, t), 0);
    const k = parts.reduce((s, p) => s + ((LEAN_MEAT_COMPOSITION[p] / poly(CHOI_OKOS[p].rho, t)) * rho) * poly(CHOI_OKOS[p].k, t), 0);
    return { k, rho, cp };
  }

  it('the composition adds up to one', () => {
    expect(parts.reduce((s, p) => s + LEAN_MEAT_COMPOSITION[p], 0)).toBeCloseTo(1, 12);
  });

  it.each([0, 10, 20, 30, 40, 50, 60, 70, 80, 90])('at %i degC the tables agree with the Choi-Okos correlations', (t) => {
    const ref = choiOkos(t);
    const source = 'Choi and Okos 1986 (from memory)';
    expectRelative(`k(${t})`, at(leanMeatProduct.conductivityWPerMK, t), ref.k, ROUNDING_REL_TOL, source);
    // density and cp rows are every 20 degC; linear interpolation of these gentle curves adds < 0.05 %.
    expectRelative(`rho(${t})`, at(leanMeatProduct.densityKgPerM3, t), ref.rho, ROUNDING_REL_TOL, source);
    expectRelative(`cp(${t})`, at(leanMeatProduct.specificHeatJPerKgK, t), ref.cp, ROUNDING_REL_TOL, source);
  });

  it('lies in the band ASHRAE gives for lean meats above freezing', () => {
    // ASHRAE Handbook, Refrigeration, Thermal Properties of Foods: lean meats above freezing cp about
    // 3.5-3.8 kJ/kg K, k about 0.45-0.55 W/m K near room temperature, density about 1050 kg/m3 (from memory).
    const ashrae = 'ASHRAE Handbook, Refrigeration, Thermal Properties of Foods (from memory)';
    expectWithin('cp(20 degC)', at(leanMeatProduct.specificHeatJPerKgK, 20), 3500, 4000, ashrae);
    expectWithin('k(20 degC)', at(leanMeatProduct.conductivityWPerMK, 20), 0.4, 0.6, ashrae);
    expectWithin('rho(20 degC)', at(leanMeatProduct.densityKgPerM3, 20), 1000, 1100, ashrae);
  });

  it('stays above freezing and carries the food-safety caution', () => {
    for (const rows of [leanMeatProduct.conductivityWPerMK, leanMeatProduct.densityKgPerM3, leanMeatProduct.specificHeatJPerKgK]) expect(rows[0][0]).toBeGreaterThanOrEqual(0);
    expect(leanMeatProduct.cautions.join(' ')).toMatch(/local food codes/);
    expect(leanMeatProduct.cautions.join(' ')).toMatch(/does not certify/);
  });
});
