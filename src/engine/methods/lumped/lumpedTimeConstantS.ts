// Time constant of a body at one temperature, tau = rho c V / (h As), s
// (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eq. 5.7, from memory).
import type { Geometry } from '@/engine/geometry/geometry';
import type { MaterialModel } from '@/engine/properties/materialModel';
import type { SurfaceBoundary } from '@/engine/properties/surfaceBoundary';

/** tau with rho c and h (convection only) evaluated at temperatureK. */
export function lumpedTimeConstantS(geometry: Geometry, material: MaterialModel, boundary: SurfaceBoundary, temperatureK: number): number {
  return (material.volumetricHeatCapacity(temperatureK) * geometry.volumeM3) / (boundary.convectionCoefficient(temperatureK) * geometry.cooledAreaM2);
}
