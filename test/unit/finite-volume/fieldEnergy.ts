// Test reference: heat given up between two 1-D fields, from the plan's property tables, independent of the solver:
// e(T) = integral of rho cp dT by adaptive Simpson, the volume integral of e(T(x)) x^m (cylinder m = 1, sphere m = 2)
// of the piecewise-linear grid field by composite Simpson on SUBINTERVALS pieces of each node interval.
// Burden and Faires, Numerical Analysis, 9th ed., Secs. 4.3, 4.4 and 4.6 (from memory).
import { materialModel } from '@/engine/properties/materialModel';
import { geometryOf } from '@/engine/geometry/geometry';
import type { Field } from '@/engine/fields';
import type { Material } from '@/schema/planSchema';
import type { Shape1D } from './exactSeries1D';
import { shapeOf } from './stageProblemFixture';
import { adaptiveSimpson } from './adaptiveSimpson';

const REFERENCE_K = 300;
/** Simpson pieces per node interval (even). */
const SUBINTERVALS = 16;

/** Stored energy of a field relative to REFERENCE_K, on the geometry's basis (J per part, per m², per m). */
export function storedEnergyOf(material: Material, shape: Shape1D, lengthM: number, field: Field): number {
  const model = materialModel(material);
  const e = (t: number) => adaptiveSimpson((x) => model.volumetricHeatCapacity(x), REFERENCE_K, t, 1e-3);
  const m = shape === 'slab' ? 0 : shape === 'cylinder' ? 1 : 2;
  const reducedVolume = lengthM ** (m + 1) / (m + 1);
  const geometry = geometryOf(shapeOf(shape, lengthM));
  if (field.kind === 'uniform') return e(field.temperatureK) * geometry.volumeM3;
  if (field.kind !== 'grid-1d') throw new Error(`unsupported field ${field.kind}`);
  const x = field.nodesM;
  let integral = 0;
  for (let i = 0; i + 1 < x.length; i++) {
    const width = x[i + 1] - x[i];
    const ta = field.temperaturesK[i];
    const tb = field.temperaturesK[i + 1];
    const g = (u: number) => e(ta + u * (tb - ta)) * (x[i] + u * width) ** m;
    let sum = g(0) + g(1);
    for (let j = 1; j < SUBINTERVALS; j++) sum += (j % 2 === 1 ? 4 : 2) * g(j / SUBINTERVALS);
    integral += (sum * width) / (3 * SUBINTERVALS);
  }
  return (integral * geometry.volumeM3) / reducedVolume;
}

/** Heat given up going from `from` to `to` (positive when the part cools). */
export function storedHeatBetween(material: Material, shape: Shape1D, from: Field, to: Field): number {
  const lengthM = to.kind === 'grid-1d' ? to.lengthM : from.kind === 'grid-1d' ? from.lengthM : Number.NaN;
  return storedEnergyOf(material, shape, lengthM, from) - storedEnergyOf(material, shape, lengthM, to);
}
