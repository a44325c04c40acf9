// Values of a curve known at step times, with their time derivatives, resampled at other times by piecewise
// cubic Hermite interpolation (de Boor, A Practical Guide to Splines, 1978, Ch. IV (from memory)). With exact
// slopes the error inside a step of length h is at most h⁴ max|u''''| / 384; exact at the knots. The slopes come
// from the semi-discrete equations at each step's end, so a kink of the curve at a knot (an h-table breakpoint
// crossed, the start of a quench) is kept instead of being smoothed over.

/** timesS ascending (at least one knot); atS ascending, inside [timesS[0], timesS[n - 1]]. */
export function resampleHermite(timesS: ArrayLike<number>, values: ArrayLike<number>, ratesPerS: ArrayLike<number>, atS: ArrayLike<number>): Float64Array {
  const n = timesS.length;
  const out = new Float64Array(atS.length);
  if (n === 1) return out.fill(values[0]);
  let j = 0;
  for (let s = 0; s < atS.length; s++) {
    const t = atS[s];
    while (j < n - 2 && timesS[j + 1] < t) j++;
    const h = timesS[j + 1] - timesS[j];
    const x = Math.min(Math.max((t - timesS[j]) / h, 0), 1);
    const x2 = x * x;
    const x3 = x2 * x;
    // Cubic Hermite basis on [0, 1].
    out[s] = (2 * x3 - 3 * x2 + 1) * values[j] + (x3 - 2 * x2 + x) * h * ratesPerS[j] + (-2 * x3 + 3 * x2) * values[j + 1] + (x3 - x2) * h * ratesPerS[j + 1];
  }
  return out;
}
