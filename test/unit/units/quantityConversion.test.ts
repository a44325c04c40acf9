// Display conversions of every quantity, against fixed points and factors from
// NIST Special Publication 811, 2008 ed., Appendix B.8 (factors) and B.9 (temperature) (from memory).
import { describe, expect, it } from 'vitest';
import { displayUnit, QUANTITY_UNITS, type QuantityKind } from '@/features/units/quantityUnits';
import type { UnitSystem } from '@/features/units/unitSystem';

/** Round trips and fixed points: float arithmetic on a few operations, far below any shown digit. */
const FLOAT_REL_TOL = 1e-12;

function expectClose(label: string, got: number, expected: number, relTol = FLOAT_REL_TOL) {
  const tolerance = relTol * Math.max(1, Math.abs(expected));
  expect(Math.abs(got - expected), `${label}: got ${got}, expected ${expected}, tolerance ${tolerance}`).toBeLessThanOrEqual(tolerance);
}

describe('temperature scales (NIST SP 811 B.9: t/°C = T/K − 273.15, t/°F = 1.8 t/°C + 32) (from memory)', () => {
  const cases: [number, number, number][] = [
    // [T/K, t/°C, t/°F]
    [273.15, 0, 32],
    [373.15, 100, 212],
    [233.15, -40, -40],
    [0, -273.15, -459.67],
    [1123.15, 850, 1562],
  ];
  it.each(cases)('%d K = %d °C = %d °F', (k, c, f) => {
    expectClose(`${k} K to °C`, displayUnit('temperature', 'si').fromSI(k), c);
    expectClose(`${k} K to °F`, displayUnit('temperature', 'us').fromSI(k), f);
    expectClose(`${f} °F to K`, displayUnit('temperature', 'us').toSI(f), k);
    expectClose(`${c} °C to K`, displayUnit('temperature', 'si').toSI(c), k);
  });
});

describe('temperature differences and rates convert without the offset', () => {
  it('a 100 K difference is 180 °F (interval), not 212', () => {
    expectClose('100 K difference', displayUnit('temperatureDifference', 'us').fromSI(100), 180);
    expectClose('100 K difference in SI', displayUnit('temperatureDifference', 'si').fromSI(100), 100);
  });
  it('a cooling rate of 10 K/s is 18 °F/s', () => {
    expectClose('10 K/s', displayUnit('coolingRate', 'us').fromSI(10), 18);
  });
});

describe('other quantities against NIST SP 811 B.8 factors (from memory)', () => {
  // [quantity, SI value, US value shown]: each pair is one published factor applied by hand.
  const cases: [QuantityKind, number, number, string][] = [
    ['length', 0.0254, 1, '1 in = 2.54E-02 m'],
    ['length', 0.3048, 12, '1 ft = 12 in = 3.048E-01 m'],
    ['heatTransferCoefficient', 5.678263, 1, '1 Btu/(h·ft²·°F) = 5.678263 W/(m²·K)'],
    ['conductivity', 1.730735, 1, '1 Btu/(h·ft·°F) = 1.730735 W/(m·K)'],
    ['density', 16.01846, 1, '1 lb/ft³ = 1.601846E+01 kg/m³'],
    ['specificHeat', 4186.8, 1, '1 Btu/(lb·°F) = 4.1868E+03 J/(kg·K)'],
    ['heat', 1055.056, 1, '1 Btu_IT = 1.055056E+03 J'],
  ];
  // The printed factors have 7 digits: half a unit in the 7th digit, relative.
  const PRINTED_7_DIGIT_REL_TOL = 1e-6;
  it.each(cases)('%s: %d SI shows as %d US (%s)', (kind, si, us) => {
    expectClose(`${kind} ${si} SI to US`, displayUnit(kind, 'us').fromSI(si), us, PRINTED_7_DIGIT_REL_TOL);
  });
  it('SI display units: mm, kJ, and base units elsewhere', () => {
    expectClose('0.0254 m in mm', displayUnit('length', 'si').fromSI(0.0254), 25.4);
    expectClose('412000 J in kJ', displayUnit('heat', 'si').fromSI(412000), 412);
    expectClose('h in SI', displayUnit('heatTransferCoefficient', 'si').fromSI(350), 350);
  });
});

describe('every display unit round-trips', () => {
  const kinds = Object.keys(QUANTITY_UNITS) as QuantityKind[];
  const systems: UnitSystem[] = ['si', 'us'];
  const values = [0.001, 1, 298.15, 1.2e5];
  for (const kind of kinds)
    for (const system of systems)
      it(`${kind} in ${system}`, () => {
        const unit = displayUnit(kind, system);
        for (const v of values) expectClose(`${kind} ${system} ${v}`, unit.toSI(unit.fromSI(v)), v);
      });
});
