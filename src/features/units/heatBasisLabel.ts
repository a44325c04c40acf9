// What a heat figure is counted per: a whole part, a square metre (foot) of cooled face of a plate,
// or a metre (foot) of a long part. The engine's basis strings are the SI wording.
import type { Geometry } from '@/engine/geometry/geometry';
import type { UnitSystem } from './unitSystem';

export type HeatBasis = Geometry['basis'];

const LABELS: Record<HeatBasis, Record<UnitSystem, string>> = {
  part: { si: 'per part', us: 'per part' },
  'per m² of cooled face': { si: 'per m² of cooled face', us: 'per ft² of cooled face' },
  'per m of length': { si: 'per m of length', us: 'per ft of length' },
};

export function heatBasisLabel(basis: HeatBasis, system: UnitSystem): string {
  return LABELS[basis][system];
}
