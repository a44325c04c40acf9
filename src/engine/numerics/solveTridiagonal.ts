// Thomas algorithm for a tridiagonal system, in place, no allocation.
// Press et al., Numerical Recipes, 3rd ed., Sec. 2.4 (tridag) (from memory).
// Valid without pivoting for diagonally dominant matrices (the implicit conduction matrices here);
// cost 8n flops, error at the level of the matrix condition number times machine precision.

/**
 * Solves lower[i] x[i-1] + diag[i] x[i] + upper[i] x[i+1] = rhs[i], i = 0..n-1
 * (lower[0] and upper[n-1] unused). The solution is written to `x`; `work` (length n) is scratch.
 */
export function solveTridiagonal(
  n: number,
  lower: Float64Array,
  diag: Float64Array,
  upper: Float64Array,
  rhs: Float64Array,
  x: Float64Array,
  work: Float64Array,
): void {
  let inv = 1 / diag[0];
  x[0] = rhs[0] * inv;
  for (let i = 1; i < n; i++) {
    const w = upper[i - 1] * inv;
    work[i] = w;
    inv = 1 / (diag[i] - lower[i] * w);
    x[i] = (rhs[i] - lower[i] * x[i - 1]) * inv;
  }
  for (let i = n - 2; i >= 0; i--) x[i] -= work[i + 1] * x[i + 1];
}
