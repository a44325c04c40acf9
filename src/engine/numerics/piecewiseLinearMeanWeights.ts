// Node weights w_i of the weighted mean of a piecewise-linear profile on [0, lengthM]:
//   mean = (d + 1) / L^(d+1) int_0^L T(x) x^d dx = sum_i w_i T_i,
// T linear between nodes and held at the end values outside [nodes[0], nodes[last]].
// Method: 2-point Gauss-Legendre per piece, exact for the cubic T(x) x^d with d <= 2
// (Abramowitz & Stegun, Handbook of Mathematical Functions, Eq. 25.4.29 and Table 25.4, from memory).
// Expected error: rounding only (~1e-16 relative). The weights sum to 1.

const GAUSS_2_OFFSET = 0.5 / Math.sqrt(3);

export function piecewiseLinearMeanWeights(nodesM: ArrayLike<number>, lengthM: number, weightPower: 0 | 1 | 2): Float64Array {
  const n = nodesM.length;
  const w = new Float64Array(n);
  const scale = (weightPower + 1) / lengthM ** (weightPower + 1);
  const add = (a: number, b: number, i: number, j: number) => {
    // Piece [a, b] where T goes linearly from T_i (at a) to T_j (at b); i === j for a constant piece.
    const h = b - a;
    if (h <= 0) return;
    for (const offset of [0.5 - GAUSS_2_OFFSET, 0.5 + GAUSS_2_OFFSET]) {
      const x = a + offset * h;
      const g = 0.5 * h * x ** weightPower * scale;
      w[i] += g * (1 - offset);
      w[j] += g * offset;
    }
  };
  add(0, Math.min(nodesM[0], lengthM), 0, 0);
  for (let i = 0; i + 1 < n; i++) add(nodesM[i], Math.min(nodesM[i + 1], lengthM), i, i + 1);
  add(nodesM[n - 1], lengthM, n - 1, n - 1);
  return w;
}
