// Coefficients b_n of a start field on the new stage's eigenfunctions: T(x, 0) - T_inf = sum b_n X(lambda_n x*),
//   b_n = int_0^1 (T - T_inf) X_n x^d dx / norm_n   (orthogonality of the Sturm-Liouville eigenfunctions with weight
//   x^d, Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed., Secs. 3.9, 7.7, 9.8, from memory).
// uniform:   b_n = (T - T_inf) C_n (closed form, eigenfunction.ts).
// series-1d: exact inner products of two eigenfunctions of other Bi, in closed form (see innerProduct below).
// grid-1d:   the piecewise-linear profile integrated against X_n x^d by 6-point Gauss-Legendre on sub-pieces no
//            longer than 1/lambda_n (error below 1e-15 relative per piece: (lambda h)^12 / 12! scale, A&S 25.4.30,
//            from memory), pieces split at the nodes so the kinks of the profile are integrated exactly.
import type { Field1D } from '@/engine/fields';
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { besselJ0 } from '@/engine/numerics/besselJ0';
import { besselJ1 } from '@/engine/numerics/besselJ1';
import { GAUSS_LEGENDRE_6_NODES, GAUSS_LEGENDRE_6_WEIGHTS } from '@/engine/numerics/gaussLegendre6';
import { eigenfunction, eigenfunctionMean, eigenfunctionNorm, uniformStartCoefficient, weightPower } from './eigenfunction';

/** Below this |lambda - mu| the trigonometric inner products switch to the sinc form (no cancellation). */
const TRIG_CLOSE_EIGENVALUES = 1e-3;
/** Below this |lambda - mu| the Lommel quotient is replaced by its first-order Taylor form (error ~ d^2 ~ 3e-11). */
const LOMMEL_CLOSE_EIGENVALUES = 5e-6;

function sinc(z: number): number {
  return z === 0 ? 1 : Math.sin(z) / z;
}

/** Values at an eigenvalue the inner products need: sin and cos (slab, sphere), or J0 in `sin` and J1 in `cos` (cylinder). */
interface Values { sin: number; cos: number }

/**
 * int_0^1 X(mu x) X(lambda x) x^d dx:
 *   slab     (lambda sin lambda cos mu - mu sin mu cos lambda) / (lambda^2 - mu^2) = [sinc(lambda-mu) + sinc(lambda+mu)]/2
 *   sphere   (mu sin lambda cos mu - lambda cos lambda sin mu) / (lambda mu (lambda^2 - mu^2))
 *            = [sinc(lambda-mu) - sinc(lambda+mu)] / (2 lambda mu)
 *   (product-to-sum formulas, Abramowitz & Stegun, Handbook of Mathematical Functions, Eqs. 4.3.31-4.3.32, from memory)
 *   cylinder (lambda J1(lambda) J0(mu) - mu J1(mu) J0(lambda)) / (lambda^2 - mu^2), and for mu -> lambda
 *            (J0^2 + J1^2)/2 - (mu - lambda) J1^2 / (2 lambda)
 *   (Lommel's integrals, Watson, A Treatise on the Theory of Bessel Functions, 2nd ed., Sec. 5.11, from memory;
 *   the derivative from d(t^2 J1^2)/dt = 2 t^2 J0 J1.)
 */
function innerProduct(geometry: SeriesGeometry, mu: number, m: Values, lambda: number, l: Values): number {
  const d = lambda - mu;
  if (geometry === 'slab') {
    if (Math.abs(d) < TRIG_CLOSE_EIGENVALUES) return 0.5 * (sinc(d) + sinc(lambda + mu));
    return (lambda * l.sin * m.cos - mu * m.sin * l.cos) / (d * (lambda + mu));
  }
  if (geometry === 'sphere') {
    if (Math.abs(d) < TRIG_CLOSE_EIGENVALUES) return (sinc(d) - sinc(lambda + mu)) / (2 * lambda * mu);
    return (mu * l.sin * m.cos - lambda * l.cos * m.sin) / (lambda * mu * d * (lambda + mu));
  }
  // Cylinder: sin holds J0 and cos holds J1 for this shape (see valuesAt).
  if (Math.abs(d) < LOMMEL_CLOSE_EIGENVALUES) return 0.5 * (l.sin * l.sin + l.cos * l.cos) + (d * l.cos * l.cos) / (2 * lambda);
  return (lambda * l.cos * m.sin - mu * m.cos * l.sin) / (d * (lambda + mu));
}

function valuesAt(geometry: SeriesGeometry, z: number): Values {
  return geometry === 'cylinder' ? { sin: besselJ0(z), cos: besselJ1(z) } : { sin: Math.sin(z), cos: Math.cos(z) };
}

function gridIntegral(geometry: SeriesGeometry, nodes: Float64Array, values: Float64Array, lambda: number): number {
  // int_0^1 f(x) X(lambda x) x^d dx for f linear between (dimensionless) nodes, constant beyond the end nodes.
  const d = weightPower(geometry);
  const n = nodes.length;
  let total = 0;
  const piece = (a: number, b: number, fa: number, fb: number) => {
    const h = b - a;
    if (h <= 0) return;
    const parts = Math.max(1, Math.ceil(lambda * h));
    const sub = h / parts;
    for (let p = 0; p < parts; p++) {
      const left = a + p * sub;
      for (let g = 0; g < 6; g++) {
        const x = left + 0.5 * sub * (1 + GAUSS_LEGENDRE_6_NODES[g]);
        const f = fa + ((fb - fa) * (x - a)) / h;
        total += 0.5 * sub * GAUSS_LEGENDRE_6_WEIGHTS[g] * f * eigenfunction(geometry, lambda * x) * x ** d;
      }
    }
  };
  piece(0, Math.min(nodes[0], 1), values[0], values[0]);
  for (let i = 0; i + 1 < n; i++) piece(nodes[i], Math.min(nodes[i + 1], 1), values[i], values[i + 1]);
  piece(nodes[n - 1], 1, values[n - 1], values[n - 1]);
  return total;
}

/**
 * b_n (K) of the start field on the eigenfunctions lambdas of a stage with medium at mediumK, for a 1-D shape of the
 * given geometry and length. Throws if a series or grid field belongs to another geometry or length.
 */
export function projectField(start: Field1D, geometry: SeriesGeometry, lengthM: number, mediumK: number, lambdas: Float64Array): Float64Array {
  const out = new Float64Array(lambdas.length);
  if (start.kind === 'uniform') {
    const excess = start.temperatureK - mediumK;
    for (let n = 0; n < lambdas.length; n++) out[n] = excess * uniformStartCoefficient(geometry, lambdas[n]);
    return out;
  }
  if (start.geometry !== geometry || Math.abs(start.lengthM - lengthM) > 1e-12 * lengthM) {
    throw new Error(`start field is a ${start.geometry} of ${start.lengthM} m, the stage a ${geometry} of ${lengthM} m`);
  }
  const d = weightPower(geometry);
  if (start.kind === 'series-1d') {
    const mus = start.eigenvalues;
    const mv = Array.from(mus, (mu) => valuesAt(geometry, mu));
    const offsetExcess = start.offsetK - mediumK;
    for (let n = 0; n < lambdas.length; n++) {
      const lambda = lambdas[n];
      const lv = valuesAt(geometry, lambda);
      // int X_n x^d = mean(X_n) / (d + 1).
      let sum = (offsetExcess * eigenfunctionMean(geometry, lambda)) / (d + 1);
      for (let m = 0; m < mus.length; m++) sum += start.amplitudesK[m] * innerProduct(geometry, mus[m], mv[m], lambda, lv);
      out[n] = sum / eigenfunctionNorm(geometry, lambda);
    }
    return out;
  }
  const nodes = Float64Array.from(start.nodesM, (x) => x / lengthM);
  const excess = Float64Array.from(start.temperaturesK, (t) => t - mediumK);
  for (let n = 0; n < lambdas.length; n++) out[n] = gridIntegral(geometry, nodes, excess, lambdas[n]) / eigenfunctionNorm(geometry, lambdas[n]);
  return out;
}
