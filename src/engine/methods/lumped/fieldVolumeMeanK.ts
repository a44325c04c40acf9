// Volume-mean temperature of any start field: what a body at one temperature starts from (energy conserving).
// 1-D fields: evaluateField1D.meanTemperature; product fields: product of axis means (productFieldMeanK);
// tensor grids: the finite-volume control-volume sum (tensorGridMeanK), so energy matches the solver that wrote it.
import type { Field } from '@/engine/fields';
import type { Geometry } from '@/engine/geometry/geometry';
import { meanTemperature } from '../series/evaluateField1D';
import { productFieldMeanK } from '../product/productFieldTemperatureAt';
import { tensorGridMeanK } from '../finite-volume-2d/tensorGridMeanK';

export function fieldVolumeMeanK(field: Field, geometry: Geometry): number {
  switch (field.kind) {
    case 'uniform':
    case 'series-1d':
    case 'grid-1d':
      return meanTemperature(field);
    case 'product':
      return productFieldMeanK(field);
    case 'tensor-grid':
      if (!geometry.finiteAxes) throw new Error('a tensor-grid field needs a finite shape with axes');
      return tensorGridMeanK(field, geometry.finiteAxes);
  }
}
