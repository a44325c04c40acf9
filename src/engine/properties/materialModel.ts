// Material properties as functions of temperature, built once from the plan's constants or tables.
import type { Material, PropertyInput } from '@/schema/planSchema';
import { interpolateTable } from '../numerics/interpolateTable';

export interface PropertyModel {
  at(temperatureK: number): number;
  isConstant: boolean;
  /** Smallest and largest value over the given temperature range (for the variation warning). */
  rangeOver(lowK: number, highK: number): { min: number; max: number };
  /** Table temperatures where the piecewise-linear property changes slope (none when constant), K: ODE solvers stop their steps there. */
  breakpointsK?: readonly number[];
}

export interface MaterialModel {
  name: string;
  conductivity: PropertyModel;
  density: PropertyModel;
  specificHeat: PropertyModel;
  /** rho(T) * cp(T), J/(m³ K): the heat capacity per volume of the fixed grid. */
  volumetricHeatCapacity(temperatureK: number): number;
  isConstant: boolean;
}

function propertyModel(p: PropertyInput): PropertyModel {
  if (typeof p === 'number') return { at: () => p, isConstant: true, rangeOver: () => ({ min: p, max: p }), breakpointsK: [] };
  const xs = Float64Array.from(p.table, (r) => r[0]);
  const ys = Float64Array.from(p.table, (r) => r[1]);
  const at = (t: number) => interpolateTable(xs, ys, t);
  return {
    at,
    isConstant: false,
    breakpointsK: Array.from(xs),
    rangeOver(lowK, highK) {
      // Extremes of a piecewise-linear function lie at the ends or at table rows inside.
      let min = Math.min(at(lowK), at(highK));
      let max = Math.max(at(lowK), at(highK));
      for (let i = 0; i < xs.length; i++) {
        if (xs[i] > lowK && xs[i] < highK) {
          min = Math.min(min, ys[i]);
          max = Math.max(max, ys[i]);
        }
      }
      return { min, max };
    },
  };
}

export function materialModel(m: Material): MaterialModel {
  const conductivity = propertyModel(m.conductivityWPerMK);
  const density = propertyModel(m.densityKgPerM3);
  const specificHeat = propertyModel(m.specificHeatJPerKgK);
  return {
    name: m.name,
    conductivity,
    density,
    specificHeat,
    volumetricHeatCapacity: (t) => density.at(t) * specificHeat.at(t),
    isConstant: conductivity.isConstant && density.isConstant && specificHeat.isConstant,
  };
}
