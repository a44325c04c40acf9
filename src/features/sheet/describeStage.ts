// Words for a stage's inputs on the sheet and in tables: medium, heat transfer, end condition.
import type { EndCondition, Medium } from '@/schema/planSchema';
import type { UnitSystem } from '@/features/units/unitSystem';
import { formatQuantity } from '@/features/units/formatQuantity';

export function describeHeatTransfer(medium: Medium, system: UnitSystem): string {
  const ht = medium.heatTransfer;
  const convective =
    ht.kind === 'constant'
      ? `h = ${formatQuantity('heatTransferCoefficient', ht.hWPerM2K, system)}`
      : `h(surface T) curve, ${ht.rows.length} rows, ${formatQuantity('heatTransferCoefficient', Math.min(...ht.rows.map((r) => r[1])), system, { bare: true })}–${formatQuantity('heatTransferCoefficient', Math.max(...ht.rows.map((r) => r[1])), system)}`;
  return medium.radiation ? `${convective}; radiation, emissivity ${medium.radiation.emissivity}` : convective;
}

const POINT_WORDS: Record<string, string> = { centre: 'centre', surface: 'surface', mean: 'volume mean' };

export function describeEndCondition(end: EndCondition, system: UnitSystem): string {
  if (end.kind === 'duration') return `after ${formatQuantity('duration', end.seconds, system)}`;
  const where = end.point === 'depth' ? `${formatQuantity('length', end.depthM ?? 0, system)} below the surface` : (POINT_WORDS[end.point] ?? end.point);
  return `when ${where} reaches ${formatQuantity('temperature', end.temperature, system)}`;
}
