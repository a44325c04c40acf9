// Root of a continuous function on a bracket [a, b] with f(a) f(b) <= 0.
// Method: Brent's zero finder (bisection safeguarding secant and inverse quadratic interpolation),
// Brent, Algorithms for Minimization without Derivatives, 1973, Ch. 4 ("zero"); Press et al., Numerical Recipes,
// 3rd ed., Sec. 9.3 (from memory). Convergence: stops when the bracket is below 4 eps |x| + absoluteToleranceX
// or f is exactly zero. Expected error: within that bracket; never worse than bisection (about log2 steps).

const EPSILON = 2.220446049250313e-16;
const MAX_ITERATIONS = 200;

export class RootNotBracketedError extends Error {}

/**
 * Returns x in [a, b] with f(x) = 0 to the tolerance. fa, fb may be passed when already known.
 * Throws RootNotBracketedError when f(a) and f(b) have the same strict sign.
 */
export function findRootBracketed(f: (x: number) => number, a: number, b: number, absoluteToleranceX = 0, fa = f(a), fb = f(b)): number {
  if (fa === 0) return a;
  if (fb === 0) return b;
  if ((fa > 0) === (fb > 0)) throw new RootNotBracketedError(`no sign change on [${a}, ${b}]: f(a) = ${fa}, f(b) = ${fb}`);
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    if ((fb > 0) === (fc > 0)) {
      // Keep the root between b and c.
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a;
      fa = fb; fb = fc; fc = fa;
    }
    const tol = 2 * EPSILON * Math.abs(b) + 0.5 * absoluteToleranceX;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // Interpolate: secant when a == c, else inverse quadratic (Brent 1973, Ch. 4).
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return b;
}
