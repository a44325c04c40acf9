// A Biot number labelled by the length it is built on: "Bi (Lc = V/As = 12.5 mm) = 0.0078", "Bi (r0 = 25 mm) = 0.94".
// The engine's length labels read "Lc = V/As" or "r0 (radius)"; a bracketed description is moved to the title.
import type { BiotNumbers } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import { formatQuantity } from '@/features/units/formatQuantity';
import { formatNumber } from '@/features/units/formatNumber';

export const DIMENSIONLESS_DIGITS = { kind: 'significant', count: 2 } as const;
const SYMBOL_WITH_DESCRIPTION = /^(\S+) \((.+)\)$/;

export interface LengthLabel {
  symbol: string;
  description: string | null;
}

export function splitLengthLabel(lengthLabel: string): LengthLabel {
  const m = SYMBOL_WITH_DESCRIPTION.exec(lengthLabel);
  return m ? { symbol: m[1], description: m[2] } : { symbol: lengthLabel, description: null };
}

export function biotText(biot: BiotNumbers['lumped'], system: UnitSystem): { text: string; title: string | null } {
  const { symbol, description } = splitLengthLabel(biot.lengthLabel);
  return {
    text: `Bi (${symbol} = ${formatQuantity('length', biot.lengthM, system)}) = ${formatNumber(biot.value, DIMENSIONLESS_DIGITS)}`,
    title: description,
  };
}
