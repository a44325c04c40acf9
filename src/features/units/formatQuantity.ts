// A quantity held in SI, shown in the chosen unit system: "845.0 °C", "12.7 mm", "2.50 K/s".
import type { UnitSystem } from './unitSystem';
import { QUANTITY_UNITS, type QuantityKind } from './quantityUnits';
import { formatNumber } from './formatNumber';
import { formatDuration } from './formatDuration';

export interface FormatOptions {
  /** Leave the unit symbol off (for table cells under a header that carries it). */
  bare?: boolean;
}

export function formatQuantity(kind: QuantityKind, valueSI: number, system: UnitSystem, options: FormatOptions = {}): string {
  if (kind === 'duration' && !options.bare) return formatDuration(valueSI);
  const quantity = QUANTITY_UNITS[kind];
  const unit = quantity.display[system];
  const text = formatNumber(unit.fromSI(valueSI), quantity.digits);
  return options.bare ? text : `${text} ${unit.symbol}`;
}
