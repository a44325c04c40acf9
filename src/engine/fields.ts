// Temperature fields carried from one stage to the next. A stage never starts from an assumed
// uniform temperature: it starts from the field the previous stage left.
import type { SeriesGeometry } from './geometry/geometry';

/** A body at one temperature throughout (the plan's initial state). */
export interface UniformField {
  kind: 'uniform';
  temperatureK: number;
}

/**
 * An exact eigenfunction-series field of a 1-D shape:
 * T(x) = offsetK + sum_n amplitudesK[n] * X(eigenvalues[n] * x / lengthM),
 * X = cos (slab), J0 (cylinder), sin(z)/z (sphere); x from the centre.
 */
export interface Series1DField {
  kind: 'series-1d';
  geometry: SeriesGeometry;
  lengthM: number;
  offsetK: number;
  eigenvalues: Float64Array;
  amplitudesK: Float64Array;
}

/** A field sampled at nodes from the centre (x = 0) to the surface (x = lengthM), piecewise linear between. */
export interface Grid1DField {
  kind: 'grid-1d';
  geometry: SeriesGeometry;
  lengthM: number;
  nodesM: Float64Array;
  temperaturesK: Float64Array;
}

export type Field1D = UniformField | Series1DField | Grid1DField;

/** One axis factor of a separable term, dimensionless: f(x) = offset + sum_n amplitudes[n] * X(eigenvalues[n] * x / lengthM). */
export interface SeriesFactor {
  offset: number;
  eigenvalues: Float64Array;
  amplitudes: Float64Array;
}

/**
 * A sum of separable terms on a finite shape (constant properties, exact):
 * T(x) = offsetK + sum_j terms[j].weightK * prod_d factors[d](x_d),
 * axis d of geometry.finiteAxes, x_d from the centre; X = cos on linear axes, J0 on the radial axis.
 * Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed., Sec. 1.15 (product solutions) (from memory).
 */
export interface ProductField {
  kind: 'product';
  axes: { geometry: 'slab' | 'cylinder'; lengthM: number }[];
  offsetK: number;
  terms: { weightK: number; factors: SeriesFactor[] }[];
}

/**
 * A field sampled on a tensor grid over the symmetric part of a finite shape (axes as geometry.finiteAxes):
 * node positions from the centre (0) to the surface (the half-length) per axis, multilinear between.
 * temperaturesK[i0 + n0 * (i1 + n1 * i2)].
 */
export interface TensorGridField {
  kind: 'tensor-grid';
  nodesM: Float64Array[];
  temperaturesK: Float64Array;
}

export type Field = Field1D | ProductField | TensorGridField;
