// Each factor the app uses, built from exact definitions, against the factor printed in
// NIST Special Publication 811, Guide for the Use of the International System of Units (SI), 2008 ed.,
// Appendix B.8 (from memory). The tolerance is half a unit in the last printed digit: a printed factor is rounded.
import { describe, expect, it } from 'vitest';
import {
  J_PER_KGK_PER_BTU_PER_LB_F,
  J_PER_M2_PER_BTU_PER_FT2,
  JOULE_PER_BTU_IT,
  KG_PER_M3_PER_LB_PER_FT3,
  KILOGRAM_PER_POUND,
  METRE_PER_FOOT,
  METRE_PER_INCH,
  W_PER_M2K_PER_BTU_PER_H_FT2_F,
  W_PER_MK_PER_BTU_PER_H_FT_F,
} from '@/features/units/usCustomaryFactors';

/** Half a unit in the last digit of a printed number such as "5.678263" or "1.601846E+01". */
function halfLastDigit(printed: string): number {
  const [mantissa, exponent = '0'] = printed.split(/E/i);
  const decimals = mantissa.includes('.') ? mantissa.split('.')[1].length : 0;
  return 0.5 * 10 ** (Number(exponent) - decimals);
}

const NIST_SP811_B8: { name: string; got: number; printed: string }[] = [
  { name: 'inch to metre', got: METRE_PER_INCH, printed: '2.54E-02' },
  { name: 'foot to metre', got: METRE_PER_FOOT, printed: '3.048E-01' },
  { name: 'pound (avoirdupois) to kilogram', got: KILOGRAM_PER_POUND, printed: '4.5359237E-01' },
  { name: 'British thermal unit_IT to joule', got: JOULE_PER_BTU_IT, printed: '1.055056E+03' },
  { name: 'Btu_IT/(h·ft²·°F) to W/(m²·K)', got: W_PER_M2K_PER_BTU_PER_H_FT2_F, printed: '5.678263E+00' },
  { name: 'Btu_IT/(h·ft·°F) to W/(m·K)', got: W_PER_MK_PER_BTU_PER_H_FT_F, printed: '1.730735E+00' },
  { name: 'pound per cubic foot to kg/m³', got: KG_PER_M3_PER_LB_PER_FT3, printed: '1.601846E+01' },
  { name: 'Btu_IT/(lb·°F) to J/(kg·K)', got: J_PER_KGK_PER_BTU_PER_LB_F, printed: '4.1868E+03' },
  { name: 'Btu_IT per square foot to J/m²', got: J_PER_M2_PER_BTU_PER_FT2, printed: '1.135653E+04' },
];

describe('US customary factors against NIST SP 811 Appendix B.8 (from memory)', () => {
  it.each(NIST_SP811_B8)('$name', ({ name, got, printed }) => {
    const expected = Number(printed);
    const tolerance = halfLastDigit(printed);
    const difference = Math.abs(got - expected);
    expect(difference, `${name}: got ${got}, expected ${printed}, |diff| ${difference.toExponential(2)}, tolerance ${tolerance.toExponential(2)}`).toBeLessThanOrEqual(tolerance);
  });

  it('the Btu_IT/(lb·°F) factor is exactly 4186.8 J/(kg·K) (NIST SP 811 B.8 marks it exact) (from memory)', () => {
    // Float rounding of the quotient only: 1 ulp of 4186.8 is about 9e-13.
    const FLOAT_QUOTIENT_TOLERANCE = 1e-9;
    expect(Math.abs(J_PER_KGK_PER_BTU_PER_LB_F - 4186.8), `got ${J_PER_KGK_PER_BTU_PER_LB_F}`).toBeLessThan(FLOAT_QUOTIENT_TOLERANCE);
  });
});
