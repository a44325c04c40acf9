// Plain-text number formatting for displays: fixed decimals or significant digits, no locale,
// exponent form only for very large or very small magnitudes.
import type { DigitsRule } from './quantityUnits';

const PLAIN_MAX_MAGNITUDE = 1e6;
const PLAIN_MIN_MAGNITUDE = 1e-3;

export function formatNumber(value: number, digits: DigitsRule): string {
  if (!Number.isFinite(value)) return Number.isNaN(value) ? '—' : value > 0 ? '∞' : '−∞';
  if (digits.kind === 'decimals') {
    const text = value.toFixed(digits.count);
    // "-0.0" reads as a sign error; show it as zero.
    return Number(text) === 0 ? (0).toFixed(digits.count) : text;
  }
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= PLAIN_MAX_MAGNITUDE || magnitude < PLAIN_MIN_MAGNITUDE) return value.toExponential(digits.count - 1);
  return String(Number(value.toPrecision(digits.count)));
}
