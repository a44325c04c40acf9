// The form edge: text typed by the user -> a number in SI, or a sentence naming the quantity.
// A bare number is read in the unit system's display unit; a number followed by any unit the quantity
// accepts ("25 mm", "1 in", "300 K", "1 h 30 min") is read in that unit.
import type { UnitSystem } from './unitSystem';
import { QUANTITY_UNITS, type DisplayUnit, type QuantityKind } from './quantityUnits';
import { formatNumber } from './formatNumber';

export type ParseResult = { ok: true; valueSI: number } | { ok: false; message: string };

const NUMBER_THEN_REST = /^([+\-−]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+\-]?\d+)?)(.*)$/;
const NEXT_NUMBER = /\s+(?=[+\-−]?\.?\d)/;
const ABSOLUTE_ZERO_K = 0;

/** Lower-case, drop spaces, brackets, dots and degree signs, write powers as digits: "W/(m²·K)" -> "w/m2k". */
export function normaliseUnitText(text: string): string {
  return text
    .replace(/²/g, '2')
    .replace(/³/g, '3')
    .replace(/deg/gi, '')
    .replace(/[\s()·*^°⋅]/g, '')
    .toLowerCase();
}

function acceptedUnits(kind: QuantityKind, system: UnitSystem): DisplayUnit[] {
  const q = QUANTITY_UNITS[kind];
  const other: UnitSystem = system === 'si' ? 'us' : 'si';
  return [q.display[system], q.display[other], ...q.alsoAccepted];
}

function findUnit(kind: QuantityKind, system: UnitSystem, unitText: string): DisplayUnit | undefined {
  const wanted = normaliseUnitText(unitText);
  return acceptedUnits(kind, system).find((u) => [u.symbol, ...u.aliases].some((s) => normaliseUnitText(s) === wanted));
}

function unitList(kind: QuantityKind, system: UnitSystem): string {
  return [...new Set(acceptedUnits(kind, system).map((u) => u.symbol))].join(', ');
}

export function parseQuantity(kind: QuantityKind, text: string, system: UnitSystem): ParseResult {
  const q = QUANTITY_UNITS[kind];
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, message: `${q.name} is empty: type a number.` };
  let rest = trimmed;
  let totalSI = 0;
  let parts = 0;
  // Several number-unit pairs are summed ("1 h 30 min"); only durations and lengths ("1 ft 3 in") read well that way.
  while (rest !== '') {
    const m = NUMBER_THEN_REST.exec(rest);
    if (!m) return { ok: false, message: `${q.name}: "${trimmed}" is not a number${parts > 0 ? ' followed by a unit' : ''}.` };
    const value = Number(m[1].replace('−', '-'));
    // The unit runs up to the next whitespace-separated number, so "W/m2K" stays whole.
    const cut = m[2].search(NEXT_NUMBER);
    const unitText = (cut < 0 ? m[2] : m[2].slice(0, cut)).trim();
    rest = cut < 0 ? '' : m[2].slice(cut).trim();
    if (unitText === '' && (rest !== '' || parts > 0)) return { ok: false, message: `${q.name}: "${trimmed}" mixes numbers without units.` };
    const unit = unitText === '' ? q.display[system] : findUnit(kind, system, unitText);
    if (!unit) return { ok: false, message: `${q.name}: unit "${unitText}" is not known here; use one of ${unitList(kind, system)}.` };
    if (parts > 0 && kind !== 'duration' && kind !== 'length') return { ok: false, message: `${q.name}: "${trimmed}" has more than one number.` };
    totalSI += unit.toSI(value);
    parts += 1;
  }
  if (!Number.isFinite(totalSI)) return { ok: false, message: `${q.name}: "${trimmed}" is too large.` };
  if (kind === 'temperature' && totalSI <= ABSOLUTE_ZERO_K) {
    const zero = q.display[system];
    return { ok: false, message: `${q.name}: ${trimmed} is at or below absolute zero (${formatNumber(zero.fromSI(ABSOLUTE_ZERO_K), q.digits)} ${zero.symbol}).` };
  }
  return { ok: true, valueSI: totalSI };
}
