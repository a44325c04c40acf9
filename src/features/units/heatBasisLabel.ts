// What a heat figure is counted per: a whole part, a square metre (foot) of cooled face of a plate,
// or a metre (foot) of a long part. The engine's basis strings are the SI wording.
import type { Geometry } from '@/engine/geometry/geometry';
import type { UnitSystem } from './unitSystem';

export type HeatBasis = Geometry['basis'];

const LABELS: Record<HeatBasis, Record<UnitSystem, string>> = {
  part: { SI: 'per part', US: 'per part' },
  'per m² of cooled face': { SI: 'per m² of cooled face', US: 'per ft² of cooled face' },
  'per m of length': { SI: 'per m of length', US: 'per ft of length' },
};

export function heatBasisLabel(basis: HeatBasis, system: UnitSystem): string {
  return LABELS[basis][system];
}
