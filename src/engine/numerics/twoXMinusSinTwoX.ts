// 2x - sin 2x without cancellation for small x (the sphere's eigenfunction norm).
// Maclaurin series sum_{k>=1} (-1)^(k+1) (2x)^(2k+1) / (2k+1)! (Abramowitz & Stegun, Handbook of Mathematical
// Functions, Eq. 4.3.65, from memory). Direct formula for |x| >= 0.5; series error below 1e-17 relative.

const SERIES_BELOW_X = 0.5;

export function twoXMinusSinTwoX(x: number): number {
  if (Math.abs(x) >= SERIES_BELOW_X) return 2 * x - Math.sin(2 * x);
  const y = 2 * x;
  const y2 = y * y;
  let term = (y * y2) / 6;
  let sum = 0;
  for (let k = 1; k < 12; k++) {
    sum += term;
    if (Math.abs(term) < 1e-18 * Math.abs(sum)) break;
    term *= -y2 / ((2 * k + 2) * (2 * k + 3));
  }
  return sum;
}
