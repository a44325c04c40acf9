// sin x - x cos x without cancellation for small x (the sphere's uniform-start integral).
// Maclaurin series sum_{k>=1} (-1)^(k+1) 2k x^(2k+1) / (2k+1)! from the series of sin and cos
// (Abramowitz & Stegun, Handbook of Mathematical Functions, Eqs. 4.3.65-66, from memory).
// Direct formula for |x| >= 0.5 (cancellation there costs under one digit); series error below 1e-17 relative.

const SERIES_BELOW_X = 0.5;

export function sinMinusXCos(x: number): number {
  if (Math.abs(x) >= SERIES_BELOW_X) return Math.sin(x) - x * Math.cos(x);
  const x2 = x * x;
  let power = x * x2; // x^(2k+1) / (2k+1)!, k = 1
  power /= 6;
  let sum = 0;
  for (let k = 1; k < 12; k++) {
    const term = (k % 2 === 1 ? 2 * k : -2 * k) * power;
    sum += term;
    if (Math.abs(term) < 1e-18 * Math.abs(sum)) break;
    power *= x2 / ((2 * k + 2) * (2 * k + 3));
  }
  return sum;
}
