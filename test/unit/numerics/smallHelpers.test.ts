import { describe, expect, it } from 'vitest';
import { sinMinusXCos } from '@/engine/numerics/sinMinusXCos';
import { twoXMinusSinTwoX } from '@/engine/numerics/twoXMinusSinTwoX';
import { besselJZero } from '@/engine/numerics/besselJZero';
import { piecewiseLinearMeanWeights } from '@/engine/numerics/piecewiseLinearMeanWeights';
import { GAUSS_LEGENDRE_6_NODES, GAUSS_LEGENDRE_6_WEIGHTS } from '@/engine/numerics/gaussLegendre6';
import { integrateAdaptiveSimpson } from '@/engine/numerics/integrateAdaptiveSimpson';
import { integrateDormandPrince } from '@/engine/numerics/integrateDormandPrince';
import { dormandPrinceStep } from '@/engine/numerics/dormandPrinceStep';

describe('small numerical helpers', () => {
  it('sin x - x cos x and 2x - sin 2x: series branch matches the leading Taylor terms and joins the direct formula', () => {
    // Leading terms x^3/3 - x^5/30 and (2x)^3/6 - (2x)^5/120 (Maclaurin series, A&S 4.3.65-66, from memory).
    for (const x of [1e-6, 1e-3, 0.01]) {
      const a = x ** 3 / 3 - x ** 5 / 30 + x ** 7 / 840;
      const b = (2 * x) ** 3 / 6 - (2 * x) ** 5 / 120 + (2 * x) ** 7 / 5040;
      expect(Math.abs(sinMinusXCos(x) / a - 1), `sinMinusXCos(${x})`).toBeLessThan(1e-14);
      expect(Math.abs(twoXMinusSinTwoX(x) / b - 1), `twoXMinusSinTwoX(${x})`).toBeLessThan(1e-14);
    }
    // At the switch (0.5) both branches agree to rounding of the direct formula (cancellation ~ 1e-15 relative there).
    const below = 0.5 - 1e-12;
    expect(Math.abs(sinMinusXCos(below) / (Math.sin(below) - below * Math.cos(below)) - 1)).toBeLessThan(1e-13);
    expect(Math.abs(twoXMinusSinTwoX(below) / (2 * below - Math.sin(2 * below)) - 1)).toBeLessThan(1e-13);
  });

  it('zeros of J0 and J1 match Abramowitz & Stegun Table 9.5 (from memory) and McMahon at s = 1000', () => {
    const TABLE_TOLERANCE = 1e-14;
    const j0 = [2.404825557695773, 5.520078110286311, 8.653727912911013, 11.79153443901428];
    const j1 = [3.831705970207512, 7.015586669815619, 10.17346813506272];
    j0.forEach((z, i) => expect(Math.abs(besselJZero(0, i + 1) - z), `j0,${i + 1}`).toBeLessThan(TABLE_TOLERANCE * z));
    j1.forEach((z, i) => expect(Math.abs(besselJZero(1, i + 1) - z), `j1,${i + 1}`).toBeLessThan(TABLE_TOLERANCE * z));
    const b = (1000 - 0.25) * Math.PI;
    const mcMahon = b + 1 / (8 * b) - 124 / (3 * (8 * b) ** 3);
    expect(Math.abs(besselJZero(0, 1000) - mcMahon), 'next McMahon term is O(b^-5)').toBeLessThan(1e-12);
  });

  it('piecewise-linear mean weights sum to 1 and integrate x exactly with the shape weight', () => {
    const nodes = [0.001, 0.004, 0.0041, 0.012, 0.019];
    for (const d of [0, 1, 2] as const) {
      const w = piecewiseLinearMeanWeights(nodes, 0.02, d);
      expect(Math.abs(w.reduce((a, b) => a + b, 0) - 1), `d=${d} sum`).toBeLessThan(1e-15);
      // T = x between the nodes (held outside): exact mean by hand, (d+1)/L^(d+1) [int_0^x0 x0 x^d + int_x0^xn x^(d+1) + int_xn^L xn x^d].
      const L = 0.02;
      const x0 = nodes[0];
      const xn = nodes[nodes.length - 1];
      const exact = ((d + 1) / L ** (d + 1)) * ((x0 * x0 ** (d + 1)) / (d + 1) + (xn ** (d + 2) - x0 ** (d + 2)) / (d + 2) + (xn * (L ** (d + 1) - xn ** (d + 1))) / (d + 1));
      const got = nodes.reduce((s, x, i) => s + w[i] * x, 0);
      expect(Math.abs(got - exact), `d=${d}: ${got} vs ${exact}`).toBeLessThan(1e-17);
    }
  });

  it('6-point Gauss-Legendre integrates x^10 exactly and its weights sum to 2', () => {
    const sum = GAUSS_LEGENDRE_6_WEIGHTS.reduce((a, b) => a + b, 0);
    expect(Math.abs(sum - 2)).toBeLessThan(1e-15);
    const x10 = GAUSS_LEGENDRE_6_NODES.reduce((s, x, i) => s + GAUSS_LEGENDRE_6_WEIGHTS[i] * x ** 10, 0);
    expect(Math.abs(x10 - 2 / 11)).toBeLessThan(1e-15);
  });

  it('adaptive Simpson integrates a kinked function to its tolerance', () => {
    const f = (x: number) => (x < 0.3 ? 2 * x : 0.6 + 5 * (x - 0.3) ** 2);
    const exact = 0.09 + 0.6 * 0.7 + (5 * 0.7 ** 3) / 3;
    expect(Math.abs(integrateAdaptiveSimpson(f, 0, 1, 1e-12) - exact)).toBeLessThan(1e-11);
  });

  it('Dormand-Prince: local error of order 6 (kept solution), global error near the tolerance on y\' = -y', () => {
    const f = (_t: number, y: Float64Array) => Float64Array.of(-y[0]);
    const e1 = Math.abs(dormandPrinceStep(f, 0, Float64Array.of(1), 0.1).y[0] - Math.exp(-0.1));
    const e2 = Math.abs(dormandPrinceStep(f, 0, Float64Array.of(1), 0.05).y[0] - Math.exp(-0.05));
    const order = Math.log2(e1 / e2);
    expect(order, `observed local order ${order}`).toBeGreaterThan(5.7);
    expect(order).toBeLessThan(6.3);
    const r = integrateDormandPrince(f, 0, Float64Array.of(1), 5, { relativeTolerance: 1e-10, absoluteTolerance: Float64Array.of(1e-10), initialStep: 1e-3, maxSteps: 10000 }, () => true);
    expect(Math.abs(r.y[0] - Math.exp(-5)), `global error, ${r.steps} steps`).toBeLessThan(1e-10);
  });
});
