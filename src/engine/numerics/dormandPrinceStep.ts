// One step of the embedded Runge-Kutta pair of Dormand and Prince, orders 5 and 4 (local extrapolation: the 5th-order
// solution is kept). Dormand and Prince, "A family of embedded Runge-Kutta formulae", J. Comput. Appl. Math. 6 (1980)
// 19-26; coefficients as in Hairer, Norsett and Wanner, Solving Ordinary Differential Equations I, 2nd ed., Table 5.2
// of Sec. II.5 (from memory). Local error O(h^5) for the estimate, O(h^6) for the kept solution.

export type OdeRight = (t: number, y: Float64Array) => Float64Array;

const C2 = 1 / 5, C3 = 3 / 10, C4 = 4 / 5, C5 = 8 / 9;
const A21 = 1 / 5;
const A31 = 3 / 40, A32 = 9 / 40;
const A41 = 44 / 45, A42 = -56 / 15, A43 = 32 / 9;
const A51 = 19372 / 6561, A52 = -25360 / 2187, A53 = 64448 / 6561, A54 = -212 / 729;
const A61 = 9017 / 3168, A62 = -355 / 33, A63 = 46732 / 5247, A64 = 49 / 176, A65 = -5103 / 18656;
const B1 = 35 / 384, B3 = 500 / 1113, B4 = 125 / 192, B5 = -2187 / 6784, B6 = 11 / 84;
// Differences 5th - 4th order weights (4th order: 5179/57600, 0, 7571/16695, 393/640, -92097/339200, 187/2100, 1/40).
const E1 = B1 - 5179 / 57600, E3 = B3 - 7571 / 16695, E4 = B4 - 393 / 640, E5 = B5 - -92097 / 339200, E6 = B6 - 187 / 2100, E7 = -1 / 40;

export interface DormandPrinceResult {
  y: Float64Array;
  /** Estimated local error of each component (5th - 4th order). */
  error: Float64Array;
}

/** Advances y from t by h. k1 = f(t, y) may be passed when known. */
export function dormandPrinceStep(f: OdeRight, t: number, y: Float64Array, h: number, k1: Float64Array = f(t, y)): DormandPrinceResult {
  const n = y.length;
  const stage = (weights: [Float64Array, number][]) => {
    const out = Float64Array.from(y);
    for (const [k, a] of weights) for (let i = 0; i < n; i++) out[i] += h * a * k[i];
    return out;
  };
  const k2 = f(t + C2 * h, stage([[k1, A21]]));
  const k3 = f(t + C3 * h, stage([[k1, A31], [k2, A32]]));
  const k4 = f(t + C4 * h, stage([[k1, A41], [k2, A42], [k3, A43]]));
  const k5 = f(t + C5 * h, stage([[k1, A51], [k2, A52], [k3, A53], [k4, A54]]));
  const k6 = f(t + h, stage([[k1, A61], [k2, A62], [k3, A63], [k4, A64], [k5, A65]]));
  const next = stage([[k1, B1], [k3, B3], [k4, B4], [k5, B5], [k6, B6]]);
  const k7 = f(t + h, next);
  const error = new Float64Array(n);
  for (let i = 0; i < n; i++) error[i] = h * (E1 * k1[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i]);
  return { y: next, error };
}
