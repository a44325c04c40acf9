// Cooling rate of a sampled temperature curve, -dT/dt (K/s, positive when cooling), for display only.
// This is a numerical derivative of the *displayed* sampled curve, not a result of the engine; the engine's
// own largest rates come from the result (StageResult.maxSurfaceCoolingRateKPerS).
// Method: three-point Lagrange differences on a non-uniform grid, centred inside and one-sided at the ends,
// second order in the spacing. Fornberg, "Generation of finite difference formulas on arbitrarily spaced grids",
// Mathematics of Computation 51 (1988) 699-706 (from memory).
// Error: about h²/6 |T'''| inside and h²/3 |T'''| at the ends (uniform spacing h). Times must rise strictly;
// fewer than two samples give NaN.

export function coolingRateOfSamples(timeS: ArrayLike<number>, temperatureK: ArrayLike<number>): number[] {
  const n = Math.min(timeS.length, temperatureK.length);
  if (n < 2) return Array.from({ length: n }, () => Number.NaN);
  const t = (i: number) => timeS[i];
  const T = (i: number) => temperatureK[i];
  if (n === 2) {
    const slope = (T(1) - T(0)) / (t(1) - t(0));
    return [-slope, -slope];
  }
  const rates = new Array<number>(n);
  for (let i = 1; i < n - 1; i++) {
    const h1 = t(i) - t(i - 1);
    const h2 = t(i + 1) - t(i);
    // dT/dt at t_i from the parabola through i-1, i, i+1 (Fornberg 1988, three-point weights) (from memory).
    const slope = (-h2 / (h1 * (h1 + h2))) * T(i - 1) + ((h2 - h1) / (h1 * h2)) * T(i) + (h1 / (h2 * (h1 + h2))) * T(i + 1);
    rates[i] = -slope;
  }
  rates[0] = -oneSidedSlope(t(0), t(1), t(2), T(0), T(1), T(2));
  rates[n - 1] = -oneSidedSlope(t(n - 1), t(n - 2), t(n - 3), T(n - 1), T(n - 2), T(n - 3));
  return rates;
}

/** dT/dt at a from the parabola through a, b, c (any spacing, either direction). */
function oneSidedSlope(ta: number, tb: number, tc: number, Ta: number, Tb: number, Tc: number): number {
  const hb = tb - ta;
  const hc = tc - ta;
  // Derivative at ta of the Lagrange parabola through (ta,Ta), (tb,Tb), (tc,Tc) (Fornberg 1988) (from memory).
  return (-(hb + hc) / (hb * hc)) * Ta + (hc / (hb * (hc - hb))) * Tb + (-hb / (hc * (hc - hb))) * Tc;
}
