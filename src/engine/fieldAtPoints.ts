// Temperatures of any field at the geometry's reported points and its volume mean: one place
// that knows every field kind, for the plan runner and for methods that start from any field.
import type { Field } from './fields';
import type { Geometry } from './geometry/geometry';
import type { PointId } from '@/schema/planSchema';
import { temperatureAt, meanTemperature } from './methods/series/evaluateField1D';
import { productFieldTemperatureAt, productFieldMeanK } from './methods/product/productFieldTemperatureAt';
import { tensorGridTemperatureAt } from './methods/finite-volume-2d/tensorGridTemperatureAt';
import { tensorGridMeanK } from './methods/finite-volume-2d/tensorGridMeanK';

/** Profile points from the centre to the surface. */
const PROFILE_POINTS = 41;

/** Volume-mean temperature of the field, K. */
export function fieldMeanK(field: Field, geometry: Geometry): number {
  switch (field.kind) {
    case 'uniform':
      return field.temperatureK;
    case 'product':
      return productFieldMeanK(field);
    case 'tensor-grid':
      return tensorGridMeanK(field, geometry.finiteAxes ?? []);
    default:
      return meanTemperature(field);
  }
}

/** Temperature at a position (m from the centre along each axis; one number for 1-D shapes). */
export function fieldTemperatureAt(field: Field, positionM: readonly number[]): number {
  switch (field.kind) {
    case 'uniform':
      return field.temperatureK;
    case 'product':
      return productFieldTemperatureAt(field, positionM);
    case 'tensor-grid':
      return tensorGridTemperatureAt(field, positionM);
    default:
      return temperatureAt(field, positionM[0]);
  }
}

/** Temperatures at every reported point of the geometry, plus 'depth' below the cooled surface of a 1-D shape when asked. */
export function fieldAtPoints(field: Field, geometry: Geometry, depthM?: number): Partial<Record<PointId, number>> {
  const out: Partial<Record<PointId, number>> = {};
  const oneD = geometry.oneD;
  for (const p of geometry.points) {
    if (p.id === 'mean') out.mean = fieldMeanK(field, geometry);
    else if (oneD) out[p.id] = fieldTemperatureAt(field, [p.id === 'centre' ? 0 : oneD.lengthM]);
    else if (p.positionM) out[p.id] = fieldTemperatureAt(field, p.positionM);
  }
  if (oneD && depthM !== undefined) out.depth = fieldTemperatureAt(field, [Math.max(0, oneD.lengthM - depthM)]);
  return out;
}

/**
 * Temperature against position from the centre to the surface: along the series length for 1-D
 * shapes, along the axis of the shortest half-side (through the centre) for finite shapes.
 */
export function fieldProfile(field: Field, geometry: Geometry): { positionM: number[]; temperatureK: number[] } {
  const axes = geometry.finiteAxes;
  const shortest = axes ? axes.reduce((best, a, i) => (a.halfLengthM < axes[best].halfLengthM ? i : best), 0) : 0;
  const lengthM = geometry.oneD ? geometry.oneD.lengthM : axes![shortest].halfLengthM;
  const positionM: number[] = [];
  const temperatureK: number[] = [];
  for (let i = 0; i < PROFILE_POINTS; i++) {
    const x = (lengthM * i) / (PROFILE_POINTS - 1);
    positionM.push(x);
    temperatureK.push(fieldTemperatureAt(field, axes ? axes.map((_, d) => (d === shortest ? x : 0)) : [x]));
  }
  return { positionM, temperatureK };
}
