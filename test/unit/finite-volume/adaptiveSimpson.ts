// Test reference, independent of the engine's quadrature: adaptive Simpson on [a, b] to an absolute tolerance,
// Burden and Faires, Numerical Analysis, 9th ed., Sec. 4.6 (from memory).
export function adaptiveSimpson(f: (x: number) => number, a: number, b: number, tol: number, depth = 0): number {
  const c = 0.5 * (a + b);
  const whole = ((b - a) / 6) * (f(a) + 4 * f(c) + f(b));
  const left = ((c - a) / 6) * (f(a) + 4 * f(0.5 * (a + c)) + f(c));
  const right = ((b - c) / 6) * (f(c) + 4 * f(0.5 * (c + b)) + f(b));
  if (depth > 40 || Math.abs(left + right - whole) < 15 * tol) return left + right;
  return adaptiveSimpson(f, a, c, tol / 2, depth + 1) + adaptiveSimpson(f, c, b, tol / 2, depth + 1);
}
