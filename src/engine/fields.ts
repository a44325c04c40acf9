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
export type Field = Field1D;
