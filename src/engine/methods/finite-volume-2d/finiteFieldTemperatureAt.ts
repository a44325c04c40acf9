// Temperature of a finite shape's field (uniform, product or tensor grid) at one of the geometry's reported
// points, for callers outside the solvers (the plan runner's start temperatures). 'depth' is below the
// face the first axis ends on (the side of a short cylinder, face ⟂ x of a bar or block), on the mid-plane.
import type { Field } from '../../fields';
import type { Geometry } from '../../geometry/geometry';
import type { PointId } from '@/schema/planSchema';
import { productFieldMeanK, productFieldTemperatureAt } from '../product/productFieldTemperatureAt';
import { tensorGridTemperatureAt } from './tensorGridTemperatureAt';
import { tensorGridMeanK } from './tensorGridMeanK';

/** Kelvin, or null when the field or the point does not belong to this finite shape. */
export function finiteFieldTemperatureAt(field: Field, geometry: Geometry, pointId: PointId, depthM?: number): number | null {
  const axes = geometry.finiteAxes;
  if (!axes) return null;
  let positionM: number[] | null = null;
  if (pointId === 'depth') {
    if (depthM === undefined || depthM > axes[0].halfLengthM) return null;
    positionM = axes.map((a, d) => (d === 0 ? a.halfLengthM - depthM : 0));
  } else if (pointId !== 'mean') {
    const point = geometry.points.find((p) => p.id === pointId);
    if (!point?.positionM) return null;
    positionM = point.positionM;
  }
  switch (field.kind) {
    case 'uniform':
      return field.temperatureK;
    case 'product':
      if (field.axes.length !== axes.length) return null;
      return positionM ? productFieldTemperatureAt(field, positionM) : productFieldMeanK(field);
    case 'tensor-grid':
      if (field.nodesM.length !== axes.length) return null;
      return positionM ? tensorGridTemperatureAt(field, positionM) : tensorGridMeanK(field, axes);
    case 'series-1d':
    case 'grid-1d':
      return null;
  }
}
