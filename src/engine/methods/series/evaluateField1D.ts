// Value and volume mean of any 1-D field (fields.ts): uniform, exact series, or piecewise-linear grid.
// Series: T(x) = offset + sum a_n X(lambda_n x / L); mean = offset + sum a_n mean(X) (closed forms in eigenfunction.ts).
// Grid: linear interpolation between nodes (interpolateTable), mean by exact 2-point Gauss integration with the
// shape's weight 1, r, r^2 (piecewiseLinearMeanWeights). Expected error: rounding only.
import type { Field1D } from '@/engine/fields';
import { interpolateTable } from '@/engine/numerics/interpolateTable';
import { piecewiseLinearMeanWeights } from '@/engine/numerics/piecewiseLinearMeanWeights';
import { eigenfunction, eigenfunctionMean, weightPower } from './eigenfunction';

/** Temperature (K) of the field at xM metres from the centre (0 = centre, lengthM = surface). */
export function temperatureAt(field: Field1D, xM: number): number {
  switch (field.kind) {
    case 'uniform':
      return field.temperatureK;
    case 'series-1d': {
      const z = xM / field.lengthM;
      let t = field.offsetK;
      for (let n = 0; n < field.eigenvalues.length; n++) t += field.amplitudesK[n] * eigenfunction(field.geometry, field.eigenvalues[n] * z);
      return t;
    }
    case 'grid-1d':
      return interpolateTable(field.nodesM, field.temperaturesK, xM);
  }
}

/** Volume-mean temperature (K) of the field. */
export function meanTemperature(field: Field1D): number {
  switch (field.kind) {
    case 'uniform':
      return field.temperatureK;
    case 'series-1d': {
      let t = field.offsetK;
      for (let n = 0; n < field.eigenvalues.length; n++) t += field.amplitudesK[n] * eigenfunctionMean(field.geometry, field.eigenvalues[n]);
      return t;
    }
    case 'grid-1d': {
      const w = piecewiseLinearMeanWeights(field.nodesM, field.lengthM, weightPower(field.geometry));
      let t = 0;
      for (let i = 0; i < w.length; i++) t += w[i] * field.temperaturesK[i];
      return t;
    }
  }
}
