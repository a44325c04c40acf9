// The end condition of a stage in words, in the chosen units: "after 45.0 s", "when centre reaches 300.0 °C".
import type { EndCondition } from '@/schema/planSchema';
import type { UnitSystem } from '@/features/units/unitSystem';
import { formatQuantity } from '@/features/units/formatQuantity';

export const POINT_WORDS: Record<string, string> = {
  centre: 'centre',
  surface: 'surface',
  mean: 'volume mean',
  depth: 'point at depth',
  'face-x': 'face (x) middle',
  'face-y': 'face (y) middle',
  'face-z': 'face (z) middle',
  edge: 'edge',
  corner: 'corner',
};

export function describeEndCondition(end: EndCondition, system: UnitSystem): string {
  if (end.kind === 'duration') return `after ${formatQuantity('duration', end.seconds, system)}`;
  const where = end.point === 'depth' && end.depthM !== undefined ? `point ${formatQuantity('length', end.depthM, system)} deep` : POINT_WORDS[end.point];
  return `when ${where} reaches ${formatQuantity('temperature', end.temperature, system)}`;
}
