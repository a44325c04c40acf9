// Builds StageProblems for the series and lumped tests from plain numbers (SI, kelvin). Test-only.
import type { Shape } from '@/schema/planSchema';
import type { Field } from '@/engine/fields';
import type { StageEnd, StageProblem } from '@/engine/methods/stageProblem';
import { geometryOf } from '@/engine/geometry/geometry';
import { materialModel } from '@/engine/properties/materialModel';
import { surfaceBoundary } from '@/engine/properties/surfaceBoundary';

export interface FixtureInput {
  shape: Shape;
  kWPerMK: number | { table: [number, number][] };
  rhoKgPerM3: number;
  cJPerKgK: number | { table: [number, number][] };
  hWPerM2K: number | { rows: [number, number][] };
  mediumK: number;
  radiation?: { emissivity: number; surroundingsTemperature?: number };
  start: Field;
  end: StageEnd;
  sampleCount?: number;
  depthM?: number;
  toleranceK?: number;
  propertyTemperatureK?: number;
}

export function stageProblem(input: FixtureInput): StageProblem {
  const heatTransfer = typeof input.hWPerM2K === 'number' ? { kind: 'constant' as const, hWPerM2K: input.hWPerM2K } : { kind: 'surface-table' as const, rows: input.hWPerM2K.rows };
  return {
    geometry: geometryOf(input.shape),
    material: materialModel({ name: 'test solid', source: 'invented for the test', conductivityWPerMK: input.kWPerMK, densityKgPerM3: input.rhoKgPerM3, specificHeatJPerKgK: input.cJPerKgK }),
    boundary: surfaceBoundary({ name: 'test medium', temperature: input.mediumK, heatTransfer, radiation: input.radiation }),
    start: input.start,
    end: input.end,
    toleranceK: input.toleranceK ?? 0.01,
    sampleCount: input.sampleCount ?? 201,
    depthM: input.depthM,
    propertyTemperatureK: input.propertyTemperatureK ?? 600,
  };
}
