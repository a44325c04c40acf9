// Values of a curve known at step times, resampled at other times by monotone piecewise-cubic
// Hermite interpolation: Fritsch and Carlson, Monotone piecewise cubic interpolation,
// SIAM J. Numer. Anal. 17 (1980) 238, with the weighted harmonic-mean slopes of Fritsch and Butland,
// SIAM J. Sci. Stat. Comput. 5 (1984) 300 (from memory). Third-order accurate where the data are smooth,
// never overshoots between knots; exact at knots.

export function resampleMonotone(timesS: ArrayLike<number>, values: ArrayLike<number>, atS: ArrayLike<number>): Float64Array {
  const n = timesS.length;
  const out = new Float64Array(atS.length);
  if (n === 1) return out.fill(values[0]);
  const secant = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) secant[i] = (values[i + 1] - values[i]) / (timesS[i + 1] - timesS[i]);
  const slope = new Float64Array(n);
  slope[0] = secant[0];
  slope[n - 1] = secant[n - 2];
  for (let i = 1; i < n - 1; i++) {
    // Weighted harmonic mean of the neighbouring secants, zero at a local extremum (Fritsch and Butland 1984).
    const a = secant[i - 1];
    const b = secant[i];
    if (a * b <= 0) slope[i] = 0;
    else {
      const ha = timesS[i] - timesS[i - 1];
      const hb = timesS[i + 1] - timesS[i];
      const wa = 2 * hb + ha;
      const wb = hb + 2 * ha;
      slope[i] = (wa + wb) / (wa / a + wb / b);
    }
  }
  let j = 0;
  for (let s = 0; s < atS.length; s++) {
    const t = atS[s];
    while (j < n - 2 && timesS[j + 1] < t) j++;
    const h = timesS[j + 1] - timesS[j];
    const x = Math.min(Math.max((t - timesS[j]) / h, 0), 1);
    const x2 = x * x;
    const x3 = x2 * x;
    // Cubic Hermite basis.
    out[s] = (2 * x3 - 3 * x2 + 1) * values[j] + (x3 - 2 * x2 + x) * h * slope[j] + (-2 * x3 + 3 * x2) * values[j + 1] + (x3 - x2) * h * slope[j + 1];
  }
  return out;
}
