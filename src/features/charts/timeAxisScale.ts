// The time unit of a chart's time axis: seconds for short plans, minutes up to a few hours, hours beyond.
export interface TimeAxisScale {
  secondsPerUnit: number;
  symbol: 's' | 'min' | 'h';
}

const SECONDS_AXIS_UP_TO_S = 300;
const MINUTES_AXIS_UP_TO_S = 5 * 3600;

export function timeAxisScale(totalDurationS: number): TimeAxisScale {
  if (totalDurationS <= SECONDS_AXIS_UP_TO_S) return { secondsPerUnit: 1, symbol: 's' };
  if (totalDurationS <= MINUTES_AXIS_UP_TO_S) return { secondsPerUnit: 60, symbol: 'min' };
  return { secondsPerUnit: 3600, symbol: 'h' };
}
