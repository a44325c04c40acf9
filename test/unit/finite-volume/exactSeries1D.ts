// Test reference: the exact eigenfunction series for a 1-D body at uniform start temperature, convection at the
// surface, constant properties, written out from the textbook formulas (not from src/):
//   slab      theta = sum C_n exp(-l² Fo) cos(l x*),        C_n = 4 sin l / (2l + sin 2l),          l tan l = Bi
//   cylinder  theta = sum C_n exp(-l² Fo) J0(l r*),         C_n = (2/l) J1(l) / (J0²(l) + J1²(l)),  l J1(l)/J0(l) = Bi
//   sphere    theta = sum C_n exp(-l² Fo) sin(l r*)/(l r*), C_n = 4 (sin l - l cos l) / (2l - sin 2l), 1 - l cot l = Bi
// mean: slab sin l / l, cylinder 2 J1(l)/l, sphere 3 (sin l - l cos l)/l³ in place of the space function.
// Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed., Secs. 3.10, 7.7, 9.9; Incropera et al., Fundamentals of
// Heat and Mass Transfer, 6th ed., Eqs. 5.39-5.50 (from memory). J0, J1 from the `bessel` package (SheetJS).
import { besselj } from 'bessel';
import type { Series1DField } from '@/engine/fields';

export type Shape1D = 'slab' | 'cylinder' | 'sphere';
const TERMS = 200;

const j0 = (x: number) => besselj(x, 0);
const j1 = (x: number) => besselj(x, 1);

function bisect(g: (x: number) => number, a: number, b: number): number {
  let ga = g(a);
  for (let i = 0; i < 200; i++) {
    const m = 0.5 * (a + b);
    const gm = g(m);
    if (gm === 0) return m;
    if (Math.sign(gm) === Math.sign(ga)) {
      a = m;
      ga = gm;
    } else b = m;
  }
  return 0.5 * (a + b);
}

const rootCache = new Map<string, number[]>();

/** Positive roots, one per bracket between consecutive poles of the characteristic function (cached). */
function roots(shape: Shape1D, bi: number): number[] {
  const key = `${shape}:${bi}`;
  const known = rootCache.get(key);
  if (known) return known;
  const out: number[] = [];
  rootCache.set(key, out);
  const eps = 1e-12;
  if (shape === 'slab') {
    for (let n = 0; n < TERMS; n++) out.push(bisect((l) => l * Math.sin(l) - bi * Math.cos(l), n * Math.PI + eps, n * Math.PI + Math.PI / 2 - eps));
  } else if (shape === 'sphere') {
    for (let n = 0; n < TERMS; n++) out.push(bisect((l) => (1 - bi) * Math.sin(l) - l * Math.cos(l), n * Math.PI + (n === 0 ? 1e-6 : eps), (n + 1) * Math.PI - eps));
  } else {
    // Sign changes of l J1 - Bi J0 found by scanning (J0 and J1 zeros are about pi apart).
    const g = (l: number) => l * j1(l) - bi * j0(l);
    let a = 1e-9;
    let ga = g(a);
    for (let l = 0.01; out.length < TERMS; l += 0.01) {
      const gl = g(l);
      if (Math.sign(gl) !== Math.sign(ga)) {
        // Skip the sign change at a pole: none here, g has no poles. Keep the root.
        out.push(bisect(g, a, l));
      }
      a = l;
      ga = gl;
    }
  }
  return out;
}

/** First eigenvalue and coefficient (for checking the fixture against a published table). */
export function firstTerm(shape: Shape1D, bi: number): { eigenvalue: number; coefficient: number } {
  const l = roots(shape, bi)[0];
  return { eigenvalue: l, coefficient: seriesCoefficient(shape, l) };
}

/** The exact solution at Fo as a series-1d field (the first `terms` terms), for starting a stage from it. */
export function exactSeriesField(shape: Shape1D, bi: number, fo: number, lengthM: number, startK: number, mediumK: number, terms: number): Series1DField {
  const ls = roots(shape, bi).slice(0, terms);
  const amplitudesK = Float64Array.from(ls, (l) => (startK - mediumK) * seriesCoefficient(shape, l) * Math.exp(-l * l * fo));
  return { kind: 'series-1d', geometry: shape, lengthM, offsetK: mediumK, eigenvalues: Float64Array.from(ls), amplitudesK };
}

function seriesCoefficient(shape: Shape1D, l: number): number {
  return shape === 'slab' ? (4 * Math.sin(l)) / (2 * l + Math.sin(2 * l)) : shape === 'cylinder' ? ((2 / l) * j1(l)) / (j0(l) ** 2 + j1(l) ** 2) : (4 * (Math.sin(l) - l * Math.cos(l))) / (2 * l - Math.sin(2 * l));
}

export interface ExactTheta {
  centre: number;
  surface: number;
  mean: number;
  at(xStar: number): number;
}

/** Dimensionless temperature theta = (T - T_inf)/(T_i - T_inf) at Fo = alpha t / L². */
export function exactTheta(shape: Shape1D, bi: number, fo: number): ExactTheta {
  const ls = roots(shape, bi);
  const coeff = ls.map((l) => seriesCoefficient(shape, l));
  const space = (l: number, x: number) => (shape === 'slab' ? Math.cos(l * x) : shape === 'cylinder' ? j0(l * x) : x === 0 ? 1 : Math.sin(l * x) / (l * x));
  const meanFactor = (l: number) => (shape === 'slab' ? Math.sin(l) / l : shape === 'cylinder' ? (2 * j1(l)) / l : (3 * (Math.sin(l) - l * Math.cos(l))) / l ** 3);
  const at = (x: number) => ls.reduce((s, l, i) => s + coeff[i] * Math.exp(-l * l * fo) * space(l, x), 0);
  const mean = ls.reduce((s, l, i) => s + coeff[i] * Math.exp(-l * l * fo) * meanFactor(l), 0);
  return { centre: at(0), surface: at(1), mean, at };
}
