// Builders for finite-volume test problems: SI units, temperatures in kelvin, invented numbers for tests only.
import { geometryOf } from '@/engine/geometry/geometry';
import { materialModel } from '@/engine/properties/materialModel';
import { surfaceBoundary } from '@/engine/properties/surfaceBoundary';
import type { StageProblem, StageSolution, StageOutcome } from '@/engine/methods/stageProblem';
import type { Field } from '@/engine/fields';
import type { Material, Medium, Shape } from '@/schema/planSchema';
import type { Shape1D } from './exactSeries1D';

export const CONSTANT_K_W_PER_MK = 20;
export const CONSTANT_RHO_KG_PER_M3 = 7800;
export const CONSTANT_CP_J_PER_KGK = 500;
export const LENGTH_M = 0.05;
export const ALPHA_M2_PER_S = CONSTANT_K_W_PER_MK / (CONSTANT_RHO_KG_PER_M3 * CONSTANT_CP_J_PER_KGK);

export function shapeOf(shape: Shape1D, lengthM = LENGTH_M): Shape {
  return shape === 'slab' ? { kind: 'plate', halfThicknessM: lengthM } : shape === 'cylinder' ? { kind: 'long-cylinder', radiusM: lengthM } : { kind: 'sphere', radiusM: lengthM };
}

export const constantMaterial: Material = {
  name: 'test solid',
  source: 'invented test numbers',
  conductivityWPerMK: CONSTANT_K_W_PER_MK,
  densityKgPerM3: CONSTANT_RHO_KG_PER_M3,
  specificHeatJPerKgK: CONSTANT_CP_J_PER_KGK,
};

/** Temperature-dependent test material with a narrow cp peak near 1000 K (invented, steel-like magnitudes). */
export const variableMaterial: Material = {
  name: 'test alloy',
  source: 'invented test numbers',
  conductivityWPerMK: { table: [[300, 45], [700, 35], [1100, 27]] },
  densityKgPerM3: { table: [[300, 7850], [1100, 7600]] },
  specificHeatJPerKgK: { table: [[300, 460], [900, 650], [990, 700], [1000, 1500], [1010, 700], [1100, 620]] },
};

export function convection(temperatureK: number, hWPerM2K: number): Medium {
  return { name: 'test medium', temperature: temperatureK, heatTransfer: { kind: 'constant', hWPerM2K } };
}

/** A boiling-curve water bath (invented rows: film, transition peak, nucleate, convection). */
export const boilingBath: Medium = {
  name: 'test water',
  temperature: 300,
  heatTransfer: { kind: 'surface-table', rows: [[300, 800], [380, 3000], [500, 9000], [620, 12000], [750, 3000], [900, 600], [1200, 450]] },
};

export const radiatingAir: Medium = { name: 'test air', temperature: 300, heatTransfer: { kind: 'constant', hWPerM2K: 10 }, radiation: { emissivity: 0.85 } };

export function problemOf(args: {
  shape: Shape1D;
  lengthM?: number;
  material?: Material;
  medium: Medium;
  start: Field;
  end: StageProblem['end'];
  toleranceK?: number;
  sampleCount?: number;
  depthM?: number;
  signal?: AbortSignal;
}): StageProblem {
  return {
    geometry: geometryOf(shapeOf(args.shape, args.lengthM)),
    material: materialModel(args.material ?? constantMaterial),
    boundary: surfaceBoundary(args.medium),
    start: args.start,
    end: args.end,
    toleranceK: args.toleranceK ?? 0.01,
    sampleCount: args.sampleCount ?? 11,
    propertyTemperatureK: 600,
    ...(args.depthM !== undefined ? { depthM: args.depthM } : {}),
    ...(args.signal ? { signal: args.signal } : {}),
  };
}

export function solved(outcome: StageOutcome): StageSolution {
  if (!outcome.ok) throw new Error(`solver refused: ${outcome.code}: ${outcome.message}`);
  return outcome.solution;
}

export function lastOf(solution: StageSolution, point: 'centre' | 'surface' | 'mean' | 'depth'): number {
  const a = solution.samples.temperaturesK[point];
  if (!a) throw new Error(`no samples for ${point}`);
  return a[a.length - 1];
}
