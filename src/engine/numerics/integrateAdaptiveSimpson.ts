// int_a^b f(x) dx by adaptive Simpson quadrature with Richardson correction (Kuncir, Comm. ACM 5 (1962) 347;
// Lyness, J. ACM 16 (1969) 483-495, from memory). Convergence: a panel is accepted when |S_left + S_right - S_whole|
// <= 15 tol (tol halved per level); depth limited to MAX_DEPTH. Expected error: about tol for piecewise-smooth f.

const MAX_DEPTH = 40;

function simpson(fa: number, fm: number, fb: number, h: number): number {
  return (h / 6) * (fa + 4 * fm + fb);
}

function refine(f: (x: number) => number, a: number, b: number, fa: number, fm: number, fb: number, whole: number, tol: number, depth: number): number {
  const m = 0.5 * (a + b);
  const lm = 0.5 * (a + m);
  const rm = 0.5 * (m + b);
  const flm = f(lm);
  const frm = f(rm);
  const left = simpson(fa, flm, fm, m - a);
  const right = simpson(fm, frm, fb, b - m);
  const delta = left + right - whole;
  if (depth >= MAX_DEPTH || Math.abs(delta) <= 15 * tol) return left + right + delta / 15;
  return refine(f, a, m, fa, flm, fm, left, tol / 2, depth + 1) + refine(f, m, b, fm, frm, fb, right, tol / 2, depth + 1);
}

export function integrateAdaptiveSimpson(f: (x: number) => number, a: number, b: number, tolerance: number): number {
  if (a === b) return 0;
  const fa = f(a);
  const fb = f(b);
  const fm = f(0.5 * (a + b));
  return refine(f, a, b, fa, fm, fb, simpson(fa, fm, fb, b - a), tolerance, 0);
}
