// Every quantity the workbench shows, with the unit it is shown in per unit system, the units a form
// accepts for it, and how many digits to show. Values inside are si: K, m, W/(m²·K), W/(m·K), kg/m³,
// J/(kg·K), K/s, J, s. Temperature *differences* and rates convert without the scale offset.
import type { UnitSystem } from './unitSystem';
import {
  FAHRENHEIT_AT_ZERO_CELSIUS,
  J_PER_KGK_PER_BTU_PER_LB_F,
  JOULE_PER_BTU_IT,
  KELVIN_AT_ZERO_CELSIUS,
  KELVIN_PER_FAHRENHEIT_DEGREE,
  KG_PER_M3_PER_LB_PER_FT3,
  METRE_PER_FOOT,
  METRE_PER_INCH,
  SECOND_PER_HOUR,
  W_PER_M2K_PER_BTU_PER_H_FT2_F,
  W_PER_MK_PER_BTU_PER_H_FT_F,
} from './usCustomaryFactors';

export type QuantityKind =
  | 'temperature'
  | 'temperatureDifference'
  | 'length'
  | 'heatTransferCoefficient'
  | 'conductivity'
  | 'density'
  | 'specificHeat'
  | 'coolingRate'
  | 'heat'
  | 'duration';

export interface DisplayUnit {
  /** As shown beside a number. */
  symbol: string;
  /** Other spellings a form accepts (compared after normalising, see normaliseUnitText). */
  aliases: readonly string[];
  fromSI: (valueSI: number) => number;
  toSI: (valueShown: number) => number;
}

export type DigitsRule = { kind: 'decimals'; count: number } | { kind: 'significant'; count: number };

export interface QuantityUnits {
  /** The quantity in words, for labels and parse messages. */
  name: string;
  display: Record<UnitSystem, DisplayUnit>;
  /** Units a form accepts besides the two display units. */
  alsoAccepted: readonly DisplayUnit[];
  digits: DigitsRule;
}

const scaled = (symbol: string, siPerUnit: number, aliases: readonly string[] = []): DisplayUnit => ({
  symbol,
  aliases,
  fromSI: (v) => v / siPerUnit,
  toSI: (v) => v * siPerUnit,
});

const CELSIUS: DisplayUnit = {
  symbol: '°C',
  aliases: ['degC', 'C'],
  fromSI: (k) => k - KELVIN_AT_ZERO_CELSIUS,
  toSI: (c) => c + KELVIN_AT_ZERO_CELSIUS,
};
// t/°F = (9/5)(T/K − 273.15) + 32 (NIST SP 811, Appendix B.9) (from memory).
const FAHRENHEIT: DisplayUnit = {
  symbol: '°F',
  aliases: ['degF', 'F'],
  fromSI: (k) => (k - KELVIN_AT_ZERO_CELSIUS) / KELVIN_PER_FAHRENHEIT_DEGREE + FAHRENHEIT_AT_ZERO_CELSIUS,
  toSI: (f) => (f - FAHRENHEIT_AT_ZERO_CELSIUS) * KELVIN_PER_FAHRENHEIT_DEGREE + KELVIN_AT_ZERO_CELSIUS,
};
const KELVIN = scaled('K', 1, ['kelvin']);

export const QUANTITY_UNITS: Record<QuantityKind, QuantityUnits> = {
  temperature: { name: 'Temperature', display: { si: CELSIUS, us: FAHRENHEIT }, alsoAccepted: [KELVIN], digits: { kind: 'decimals', count: 1 } },
  temperatureDifference: {
    name: 'Temperature difference',
    display: { si: scaled('K', 1, ['°C', 'degC', 'C']), us: scaled('°F', KELVIN_PER_FAHRENHEIT_DEGREE, ['degF', 'F']) },
    alsoAccepted: [],
    // Significant digits: differences run from a cross-check's 0.006 K to a 400 K centre-surface spread.
    digits: { kind: 'significant', count: 3 },
  },
  length: {
    name: 'Length',
    display: { si: scaled('mm', 1e-3), us: scaled('in', METRE_PER_INCH, ['inch', '"']) },
    alsoAccepted: [scaled('m', 1), scaled('cm', 1e-2), scaled('ft', METRE_PER_FOOT)],
    digits: { kind: 'significant', count: 3 },
  },
  heatTransferCoefficient: {
    name: 'Heat transfer coefficient',
    display: { si: scaled('W/(m²·K)', 1), us: scaled('Btu/(h·ft²·°F)', W_PER_M2K_PER_BTU_PER_H_FT2_F) },
    alsoAccepted: [scaled('kW/(m²·K)', 1e3)],
    digits: { kind: 'significant', count: 3 },
  },
  conductivity: {
    name: 'Thermal conductivity',
    display: { si: scaled('W/(m·K)', 1), us: scaled('Btu/(h·ft·°F)', W_PER_MK_PER_BTU_PER_H_FT_F) },
    alsoAccepted: [],
    digits: { kind: 'significant', count: 3 },
  },
  density: {
    name: 'Density',
    display: { si: scaled('kg/m³', 1), us: scaled('lb/ft³', KG_PER_M3_PER_LB_PER_FT3) },
    alsoAccepted: [],
    digits: { kind: 'significant', count: 4 },
  },
  specificHeat: {
    name: 'Specific heat',
    display: { si: scaled('J/(kg·K)', 1), us: scaled('Btu/(lb·°F)', J_PER_KGK_PER_BTU_PER_LB_F) },
    alsoAccepted: [scaled('kJ/(kg·K)', 1e3)],
    digits: { kind: 'significant', count: 3 },
  },
  coolingRate: {
    name: 'Cooling rate',
    display: { si: scaled('K/s', 1, ['°C/s', 'degC/s']), us: scaled('°F/s', KELVIN_PER_FAHRENHEIT_DEGREE, ['degF/s', 'F/s']) },
    alsoAccepted: [scaled('K/min', 1 / 60, ['°C/min']), scaled('°F/min', KELVIN_PER_FAHRENHEIT_DEGREE / 60, ['F/min'])],
    digits: { kind: 'significant', count: 3 },
  },
  heat: {
    name: 'Heat',
    display: { si: scaled('kJ', 1e3), us: scaled('Btu', JOULE_PER_BTU_IT, ['BTU']) },
    alsoAccepted: [scaled('J', 1), scaled('MJ', 1e6)],
    digits: { kind: 'significant', count: 3 },
  },
  duration: {
    name: 'Duration',
    display: { si: scaled('s', 1, ['sec']), us: scaled('s', 1, ['sec']) },
    alsoAccepted: [scaled('min', 60), scaled('h', SECOND_PER_HOUR, ['hr'])],
    digits: { kind: 'significant', count: 3 },
  },
};

/** The unit a quantity is shown in, in a unit system (for chart axes and table headers). */
export function displayUnit(kind: QuantityKind, system: UnitSystem): DisplayUnit {
  return QUANTITY_UNITS[kind].display[system];
}
