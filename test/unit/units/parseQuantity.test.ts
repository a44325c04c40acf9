// The form edge: typed text -> SI, or a message naming the quantity.
import { describe, expect, it } from 'vitest';
import { parseQuantity } from '@/features/units/parseQuantity';
import { W_PER_M2K_PER_BTU_PER_H_FT2_F } from '@/features/units/usCustomaryFactors';

/** Parsing applies one or two float operations: far below a typed digit. */
const FLOAT_REL_TOL = 1e-12;

function expectSI(result: ReturnType<typeof parseQuantity>, expected: number, input: string) {
  if (!result.ok) throw new Error(`${input}: expected ${expected}, got error "${result.message}"`);
  const tol = FLOAT_REL_TOL * Math.max(1, Math.abs(expected));
  expect(Math.abs(result.valueSI - expected), `${input}: got ${result.valueSI}, expected ${expected}, tolerance ${tol}`).toBeLessThanOrEqual(tol);
}

describe('parseQuantity', () => {
  it('reads a bare number in the system display unit', () => {
    expectSI(parseQuantity('temperature', '850', 'si'), 1123.15, '850 (SI)');
    expectSI(parseQuantity('temperature', '32', 'us'), 273.15, '32 (US)');
    expectSI(parseQuantity('length', '25', 'si'), 0.025, '25 (SI)');
    expectSI(parseQuantity('length', '1', 'us'), 0.0254, '1 (US)');
  });
  it('reads an explicit unit from either system', () => {
    expectSI(parseQuantity('length', '2 in', 'si'), 0.0508, '2 in');
    expectSI(parseQuantity('length', '1 ft 3 in', 'si'), 0.381, '1 ft 3 in');
    expectSI(parseQuantity('temperature', '300 K', 'us'), 300, '300 K');
    expectSI(parseQuantity('temperature', '-40 °F', 'si'), 233.15, '-40 °F');
    // NIST SP 811 B.8 prints 5.678263 (from memory); the check on the printed digits is in usCustomaryFactors.test.ts.
    expectSI(parseQuantity('heatTransferCoefficient', '1 Btu/(h·ft²·°F)', 'si'), W_PER_M2K_PER_BTU_PER_H_FT2_F, '1 Btu/(h·ft²·°F)');
    expectSI(parseQuantity('heatTransferCoefficient', '2.5 kW/m2K', 'us'), 2500, '2.5 kW/m2K');
    expectSI(parseQuantity('density', '7.85e3 kg/m3', 'us'), 7850, '7.85e3 kg/m3');
    expectSI(parseQuantity('coolingRate', '18 degF/s', 'si'), 10, '18 degF/s');
  });
  it('sums duration parts', () => {
    expectSI(parseQuantity('duration', '1 h 30 min', 'si'), 5400, '1 h 30 min');
    expectSI(parseQuantity('duration', '90', 'us'), 90, '90');
    expectSI(parseQuantity('duration', '2.5 min', 'us'), 150, '2.5 min');
  });
  it.each([
    ['temperature', '', 'Temperature is empty'],
    ['heatTransferCoefficient', 'abc', 'Heat transfer coefficient: "abc" is not a number'],
    ['length', '3 furlongs', 'Length: unit "furlongs" is not known here; use one of mm, in, m, cm, ft'],
    ['temperature', '-500 °F', 'Temperature: -500 °F is at or below absolute zero (-273.1 °C)'],
    ['density', '1 2', 'Density: "1 2" mixes numbers without units'],
    ['density', '1 kg/m3 2 kg/m3', 'Density: "1 kg/m3 2 kg/m3" has more than one number'],
  ] as const)('%s "%s" -> message naming the quantity', (kind, text, start) => {
    const result = parseQuantity(kind, text, 'si');
    expect(result.ok, `${kind} "${text}" should fail`).toBe(false);
    if (!result.ok) expect(result.message.startsWith(start), `got "${result.message}", expected it to start with "${start}"`).toBe(true);
  });
});
