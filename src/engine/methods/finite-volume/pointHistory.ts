// Reported point temperatures and their time derivatives at every accepted step, and their resampling at the
// plan's evenly spaced times by cubic Hermite interpolation (values and slopes at both step ends).
// Burden and Faires, Numerical Analysis, 9th ed., Sec. 3.4 (Hermite interpolation) (from memory).
// Error: h^4 max|T''''| / 384 per step, below the step's own second-order error.

export interface PointHistory {
  count: number;
  timeS: Float64Array;
  /** values[p][j], slopes[p][j]: point p at step j. */
  values: Float64Array[];
  slopes: Float64Array[];
}

export function createPointHistory(pointCount: number, capacity: number): PointHistory {
  return {
    count: 0,
    timeS: new Float64Array(capacity),
    values: Array.from({ length: pointCount }, () => new Float64Array(capacity)),
    slopes: Array.from({ length: pointCount }, () => new Float64Array(capacity)),
  };
}

function grown(a: Float64Array): Float64Array {
  const b = new Float64Array(a.length * 2);
  b.set(a);
  return b;
}

/** Appends one row; `values` and `slopes` hold one entry per point. Grows by doubling (amortised, rare). */
export function recordPoints(history: PointHistory, timeS: number, values: Float64Array, slopes: Float64Array): void {
  if (history.count === history.timeS.length) {
    history.timeS = grown(history.timeS);
    history.values = history.values.map(grown);
    history.slopes = history.slopes.map(grown);
  }
  const j = history.count++;
  history.timeS[j] = timeS;
  for (let p = 0; p < history.values.length; p++) {
    history.values[p][j] = values[p];
    history.slopes[p][j] = slopes[p];
  }
}

/** Point p at each of `timesS` (ascending, inside the recorded span). */
export function samplePoint(history: PointHistory, p: number, timesS: Float64Array): Float64Array {
  const out = new Float64Array(timesS.length);
  const { timeS, count } = history;
  const v = history.values[p];
  const s = history.slopes[p];
  let j = 0;
  for (let i = 0; i < timesS.length; i++) {
    const t = timesS[i];
    while (j < count - 2 && timeS[j + 1] < t) j++;
    if (count === 1) {
      out[i] = v[0];
      continue;
    }
    const h = timeS[j + 1] - timeS[j];
    const u = h > 0 ? Math.min(1, Math.max(0, (t - timeS[j]) / h)) : 1;
    const u2 = u * u;
    const u3 = u2 * u;
    // Cubic Hermite basis h00, h10, h01, h11.
    out[i] = (2 * u3 - 3 * u2 + 1) * v[j] + (u3 - 2 * u2 + u) * h * s[j] + (-2 * u3 + 3 * u2) * v[j + 1] + (u3 - u2) * h * s[j + 1];
  }
  return out;
}
