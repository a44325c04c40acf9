// The readable per-stage table of the headless command (temperatures in degC, times in s).
import type { PlanResult, StageResult } from '@/engine/plan/planResult';
import type { PointId } from '@/schema/planSchema';

const C = (k: number | undefined) => (k === undefined ? '-' : (k - 273.15).toFixed(1));
const g = (x: number, d = 3) => (x === 0 ? '0' : Math.abs(x) < 1e-3 || Math.abs(x) >= 1e5 ? x.toExponential(1) : Number(x.toPrecision(d)).toString());

function pad(rows: string[][]): string {
  const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
  return rows.map((r) => r.map((cell, c) => (c <= 2 ? cell.padEnd(widths[c]) : cell.padStart(widths[c]))).join('  ')).join('\n');
}

function row(s: StageResult, pointIds: PointId[]): string[] {
  return [
    String(s.index + 1),
    s.name,
    s.method + (s.forced ? ' (forced)' : ''),
    g(s.biot.lumped.value),
    g(s.biot.series.value),
    g(s.fourierEnd),
    g(s.durationS, 4),
    ...pointIds.map((id) => `${C(s.startK[id])} > ${C(s.endK[id])}`),
    g(s.heatRemovedJ / 1000, 4),
    g(s.maxPointSpreadK, 3),
    s.crossCheck ? `${g(s.crossCheck.maxDifferenceK, 2)} (${s.crossCheck.method})` : '-',
    s.energyRelativeError === null ? '-' : g(s.energyRelativeError, 2),
    String(s.warnings.length),
  ];
}

export function formatStageTable(result: PlanResult): string {
  const pointIds = result.points.map((p) => p.id);
  const head = ['#', 'stage', 'method', 'Bi(Lc)', 'Bi(L/r0)', 'Fo end', 'time s', ...pointIds.map((id) => `${id} °C`), 'heat kJ', 'max spread K', 'x-check K', 'energy err', 'warn'];
  const legend = result.points.map((p) => `${p.id} = ${p.label}`).join('; ');
  const lines = [
    `${result.planName}: ${result.stages.length} stage(s), ${g(result.totalDurationS, 4)} s in all; heat ${result.geometry.basis}`,
    `points: ${legend}; start > end of each stage`,
    '',
    pad([head, ...result.stages.map((s) => row(s, pointIds))]),
    '',
  ];
  for (const s of result.stages) {
    lines.push(`${s.index + 1} ${s.name}: ${s.methodReason}`);
    for (const w of s.warnings) lines.push(`   [${w.severity}] ${w.message} ${w.advice}`);
  }
  if (result.failure) lines.push('', `stage ${result.failure.index + 1} (${result.failure.name}) not computed: ${result.failure.message}`);
  return `${lines.join('\n')}\n`;
}
