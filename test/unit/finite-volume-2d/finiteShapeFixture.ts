// Builders for finite-shape test problems: SI units, kelvin, invented numbers for tests only.
import { geometryOf } from '@/engine/geometry/geometry';
import { materialModel } from '@/engine/properties/materialModel';
import { surfaceBoundary } from '@/engine/properties/surfaceBoundary';
import type { StageOutcome, StageProblem, StageSolution } from '@/engine/methods/stageProblem';
import type { Field } from '@/engine/fields';
import type { Material, Medium, PointId, Shape } from '@/schema/planSchema';

export const K_W_PER_MK = 40;
export const RHO_KG_PER_M3 = 7800;
export const CP_J_PER_KGK = 500;
export const START_K = 1123;

export const constantSteel: Material = { name: 'test steel', source: 'invented test numbers', conductivityWPerMK: K_W_PER_MK, densityKgPerM3: RHO_KG_PER_M3, specificHeatJPerKgK: CP_J_PER_KGK };

/** Temperature-dependent test alloy with a cp hump near 1000 K (invented, steel-like magnitudes). */
export const variableAlloy: Material = {
  name: 'test alloy',
  source: 'invented test numbers',
  conductivityWPerMK: { table: [[300, 48], [700, 36], [1100, 27]] },
  densityKgPerM3: { table: [[300, 7850], [1100, 7600]] },
  specificHeatJPerKgK: { table: [[300, 460], [900, 650], [980, 760], [1000, 1100], [1020, 760], [1100, 620]] },
};

export function convection(temperatureK: number, hWPerM2K: number): Medium {
  return { name: 'test medium', temperature: temperatureK, heatTransfer: { kind: 'constant', hWPerM2K } };
}

/** A boiling-curve bath (invented rows: film, transition peak, nucleate, convection). */
export const boilingBath: Medium = {
  name: 'test bath',
  temperature: 330,
  heatTransfer: { kind: 'surface-table', rows: [[330, 700], [400, 2500], [520, 6000], [640, 7000], [760, 2500], [900, 600], [1200, 400]] },
};

export const radiatingAir: Medium = { name: 'test air', temperature: 300, heatTransfer: { kind: 'constant', hWPerM2K: 12 }, radiation: { emissivity: 0.8 } };

export const shortCylinder = { kind: 'short-cylinder', radiusM: 0.025, halfLengthM: 0.04 } satisfies Shape;
export const flatBar = { kind: 'bar', halfWidthM: 0.03, halfHeightM: 0.015 } satisfies Shape;
export const smallBlock = { kind: 'block', halfLengthM: 0.04, halfWidthM: 0.03, halfHeightM: 0.02 } satisfies Shape;

export function finiteProblem(args: { shape: Shape; material?: Material; medium: Medium; start?: Field; end: StageProblem['end']; toleranceK?: number; sampleCount?: number; depthM?: number; signal?: AbortSignal }): StageProblem {
  return {
    geometry: geometryOf(args.shape),
    material: materialModel(args.material ?? constantSteel),
    boundary: surfaceBoundary(args.medium),
    start: args.start ?? { kind: 'uniform', temperatureK: START_K },
    end: args.end,
    toleranceK: args.toleranceK ?? 0.01,
    sampleCount: args.sampleCount ?? 41,
    propertyTemperatureK: 700,
    ...(args.depthM !== undefined ? { depthM: args.depthM } : {}),
    ...(args.signal ? { signal: args.signal } : {}),
  };
}

export function solved(outcome: StageOutcome): StageSolution {
  if (!outcome.ok) throw new Error(`solver refused: ${outcome.code}: ${outcome.message}`);
  return outcome.solution;
}

export function curveOf(solution: StageSolution, point: PointId): Float64Array {
  const c = solution.samples.temperaturesK[point];
  if (!c) throw new Error(`no samples for ${point}`);
  return c;
}
