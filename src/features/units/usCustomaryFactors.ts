// Factors between US customary units and SI, built from the exact definitions.
// NIST Special Publication 811, Guide for the Use of the International System of Units (SI), 2008 ed.,
// Appendix B.8 and B.9 (from memory): the foot, the avoirdupois pound and the international-table Btu are
// defined exactly in SI; the compound factors below follow from them, and the tests compare each against
// the 7-digit factor printed in that appendix.

/** 1 in = 0.0254 m exactly (NIST SP 811, B.8, "inch to meter") (from memory). */
export const METRE_PER_INCH = 0.0254;
/** 1 ft = 0.3048 m exactly (NIST SP 811, B.8, "foot to meter") (from memory). */
export const METRE_PER_FOOT = 0.3048;
/** 1 lb (avoirdupois) = 0.453 592 37 kg exactly (NIST SP 811, B.8, "pound (avoirdupois) to kilogram") (from memory). */
export const KILOGRAM_PER_POUND = 0.45359237;
/** 1 Btu_IT = 1055.055 852 62 J exactly (NIST SP 811, B.8, footnote to "British thermal unit_IT"; printed as 1.055 056 E+03) (from memory). */
export const JOULE_PER_BTU_IT = 1055.05585262;
/** A temperature interval of 1 °F = 5/9 K exactly (NIST SP 811, B.9, "degree Fahrenheit (interval)") (from memory). */
export const KELVIN_PER_FAHRENHEIT_DEGREE = 5 / 9;
/** t/°F = 1.8 t/°C + 32 (NIST SP 811, B.9) (from memory). */
export const FAHRENHEIT_AT_ZERO_CELSIUS = 32;
/** Offset between the Celsius and kelvin scales (NIST SP 811, Sec. 4.2.1.1; BIPM, The International System of Units, 9th ed.) (from memory). */
export const KELVIN_AT_ZERO_CELSIUS = 273.15;
export const SECOND_PER_HOUR = 3600;

/** 1 Btu_IT/(h·ft²·°F) in W/(m²·K); NIST SP 811 B.8 prints 5.678 263 (from memory). */
export const W_PER_M2K_PER_BTU_PER_H_FT2_F = JOULE_PER_BTU_IT / (SECOND_PER_HOUR * METRE_PER_FOOT ** 2 * KELVIN_PER_FAHRENHEIT_DEGREE);
/** 1 Btu_IT/(h·ft·°F) in W/(m·K); NIST SP 811 B.8 prints 1.730 735 (from memory). */
export const W_PER_MK_PER_BTU_PER_H_FT_F = JOULE_PER_BTU_IT / (SECOND_PER_HOUR * METRE_PER_FOOT * KELVIN_PER_FAHRENHEIT_DEGREE);
/** 1 lb/ft³ in kg/m³; NIST SP 811 B.8 prints 1.601 846 E+01 (from memory). */
export const KG_PER_M3_PER_LB_PER_FT3 = KILOGRAM_PER_POUND / METRE_PER_FOOT ** 3;
/** 1 Btu_IT/(lb·°F) in J/(kg·K); NIST SP 811 B.8 prints 4.1868 E+03, exact (from memory). */
export const J_PER_KGK_PER_BTU_PER_LB_F = JOULE_PER_BTU_IT / (KILOGRAM_PER_POUND * KELVIN_PER_FAHRENHEIT_DEGREE);
/** 1 Btu_IT/ft² in J/m²; NIST SP 811 B.8 prints 1.135 653 E+04 (from memory). */
export const J_PER_M2_PER_BTU_PER_FT2 = JOULE_PER_BTU_IT / METRE_PER_FOOT ** 2;
/** 1 Btu_IT/ft in J/m (no printed factor; follows from the exact Btu_IT and foot). */
export const J_PER_M_PER_BTU_PER_FT = JOULE_PER_BTU_IT / METRE_PER_FOOT;
