// Thomas algorithm split into an LU factorisation of the tridiagonal matrix (done once) and substitutions with it
// (as many right-hand sides as needed, multiplications only): the simplified-Newton iterations and the error filter
// of one TR-BDF2 stage share one factorisation.
// Press et al., Numerical Recipes, 3rd ed., Sec. 2.4 (tridag) (from memory).
// Valid without pivoting for diagonally dominant matrices (the implicit conduction matrices here); cost 3n flops and
// n divisions to factor, 5n flops per solve; error at the level of the condition number times machine precision.

export interface FactoredTridiagonal {
  n: number;
  /** Lower diagonal as given (row i couples to i - 1). */
  lower: Float64Array;
  /** 1 / pivot of each row. */
  pivotInverse: Float64Array;
  /** Multipliers upper[i - 1] / pivot[i - 1] of the back substitution. */
  ratio: Float64Array;
}

export function createFactoredTridiagonal(n: number): FactoredTridiagonal {
  return { n, lower: new Float64Array(n), pivotInverse: new Float64Array(n), ratio: new Float64Array(n) };
}

/** Factors lower[i] x[i-1] + diag[i] x[i] + upper[i] x[i+1] into `into` (lower[0], upper[n-1] unused). */
export function factorTridiagonal(into: FactoredTridiagonal, lower: Float64Array, diag: Float64Array, upper: Float64Array): void {
  const { n, pivotInverse, ratio } = into;
  into.lower.set(lower);
  let inv = 1 / diag[0];
  pivotInverse[0] = inv;
  for (let i = 1; i < n; i++) {
    const w = upper[i - 1] * inv;
    ratio[i] = w;
    inv = 1 / (diag[i] - lower[i] * w);
    pivotInverse[i] = inv;
  }
}

/** Solves the factored system for `rhs` into `x` (they may be the same array). */
export function solveFactoredTridiagonal(f: FactoredTridiagonal, rhs: Float64Array, x: Float64Array): void {
  const { n, lower, pivotInverse, ratio } = f;
  let prev = rhs[0] * pivotInverse[0];
  x[0] = prev;
  for (let i = 1; i < n; i++) {
    prev = (rhs[i] - lower[i] * prev) * pivotInverse[i];
    x[i] = prev;
  }
  for (let i = n - 2; i >= 0; i--) x[i] -= ratio[i + 1] * x[i + 1];
}
