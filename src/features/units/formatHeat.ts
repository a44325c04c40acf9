// Heat removed, on the geometry's basis, in the chosen units: "412 kJ per part", "3.91 MJ per m² of cooled face",
// "96.1 Btu per ft² of cooled face". Per-area and per-length figures change their basis with the unit system.
import type { UnitSystem } from './unitSystem';
import { heatBasisLabel, type HeatBasis } from './heatBasisLabel';
import { formatNumber } from './formatNumber';
import { QUANTITY_UNITS } from './quantityUnits';
import { JOULE_PER_BTU_IT, J_PER_M2_PER_BTU_PER_FT2, J_PER_M_PER_BTU_PER_FT } from './usCustomaryFactors';

const MEGAJOULE_FROM_J = 1e6;
const KILOJOULE_J = 1e3;

/** J on the SI basis -> the number shown and its unit, on the US basis where the system is US. */
export function heatInUnits(heatJ: number, basis: HeatBasis, system: UnitSystem): { value: number; symbol: string } {
  if (system === 'us') {
    const joulePerShown = basis === 'part' ? JOULE_PER_BTU_IT : basis === 'per m² of cooled face' ? J_PER_M2_PER_BTU_PER_FT2 : J_PER_M_PER_BTU_PER_FT;
    return { value: heatJ / joulePerShown, symbol: 'Btu' };
  }
  return Math.abs(heatJ) >= MEGAJOULE_FROM_J ? { value: heatJ / MEGAJOULE_FROM_J, symbol: 'MJ' } : { value: heatJ / KILOJOULE_J, symbol: 'kJ' };
}

export function formatHeat(heatJ: number, basis: HeatBasis, system: UnitSystem): string {
  const { value, symbol } = heatInUnits(heatJ, basis, system);
  return `${formatNumber(value, QUANTITY_UNITS.heat.digits)} ${symbol} ${heatBasisLabel(basis, system)}`;
}
