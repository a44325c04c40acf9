// Durations for display: seconds for short ones, "m min ss s" up to an hour, "h h mm min" beyond.
import { formatNumber } from './formatNumber';

const SECONDS_SHOWN_UP_TO_S = 120;
const MINUTES_SHOWN_UP_TO_S = 3600;

const twoDigits = (n: number) => String(n).padStart(2, '0');

export function formatDuration(durationS: number): string {
  if (!Number.isFinite(durationS)) return '—';
  const sign = durationS < 0 ? '-' : '';
  const s = Math.abs(durationS);
  if (s < SECONDS_SHOWN_UP_TO_S) return `${sign}${formatNumber(s, { kind: 'significant', count: 3 })} s`;
  const whole = Math.round(s);
  if (whole < MINUTES_SHOWN_UP_TO_S) {
    return `${sign}${Math.floor(whole / 60)} min ${twoDigits(whole % 60)} s`;
  }
  const minutes = Math.round(s / 60);
  return `${sign}${Math.floor(minutes / 60)} h ${twoDigits(minutes % 60)} min`;
}
