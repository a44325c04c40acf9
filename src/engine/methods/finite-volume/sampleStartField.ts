// Temperature of a uniform or sampled-grid start field at x from the centre (piecewise linear between nodes).
import type { Field1D } from '../../fields';

export function temperatureAt(field: Field1D, xM: number): number {
  if (field.kind === 'uniform') return field.temperatureK;
  if (field.kind === 'series-1d') return Number.NaN;
  const x = field.nodesM;
  const t = field.temperaturesK;
  const last = x.length - 1;
  if (xM <= x[0]) return t[0];
  if (xM >= x[last]) return t[last];
  let lo = 0, hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= xM) lo = mid;
    else hi = mid;
  }
  return t[lo] + ((xM - x[lo]) / (x[hi] - x[lo])) * (t[hi] - t[lo]);
}
