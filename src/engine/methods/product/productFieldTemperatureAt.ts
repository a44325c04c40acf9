// Evaluation of a product field (sum of separable terms) at a position and as a volume mean.
// T = offset + sum_j w_j prod_d f_jd(x_d), f = offset + sum_n a_n X(lambda_n x / L), X = cos (linear axis) or
// J0 (radial axis) (Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed., Sec. 1.15 (from memory)).
// Mean: the mean of a product over a tensor domain is the product of the axis means (weight 1 on a linear axis,
// r on the radial one); the eigenfunction means are the closed forms of series/eigenfunction.
import type { ProductField, SeriesFactor } from '../../fields';
import { eigenfunction, eigenfunctionMean } from '../series/eigenfunction';

type AxisGeometry = ProductField['axes'][number]['geometry'];

/** Value of one axis factor at x (from the centre). */
export function seriesFactorAt(factor: SeriesFactor, geometry: AxisGeometry, lengthM: number, xM: number): number {
  let sum = factor.offset;
  const xi = xM / lengthM;
  for (let n = 0; n < factor.eigenvalues.length; n++) sum += factor.amplitudes[n] * eigenfunction(geometry, factor.eigenvalues[n] * xi);
  return sum;
}

function seriesFactorMean(factor: SeriesFactor, geometry: AxisGeometry): number {
  let sum = factor.offset;
  for (let n = 0; n < factor.eigenvalues.length; n++) sum += factor.amplitudes[n] * eigenfunctionMean(geometry, factor.eigenvalues[n]);
  return sum;
}

export function productFieldTemperatureAt(field: ProductField, positionM: readonly number[]): number {
  let t = field.offsetK;
  for (const term of field.terms) {
    let product = term.weightK;
    for (let d = 0; d < field.axes.length; d++) product *= seriesFactorAt(term.factors[d], field.axes[d].geometry, field.axes[d].lengthM, positionM[d]);
    t += product;
  }
  return t;
}

export function productFieldMeanK(field: ProductField): number {
  let t = field.offsetK;
  for (const term of field.terms) {
    let product = term.weightK;
    for (let d = 0; d < field.axes.length; d++) product *= seriesFactorMean(term.factors[d], field.axes[d].geometry);
    t += product;
  }
  return t;
}
