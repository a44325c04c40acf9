// Temperature against distance from the centre at the end of each chosen stage (the result's endProfile).
// Display conversion only. Intermediate-time profiles are not in the result yet.
import type { Data } from 'plotly.js';
import type { PlanResult } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import { displayUnit } from '@/features/units/quantityUnits';
import { formatQuantity } from '@/features/units/formatQuantity';
import { formatDuration } from '@/features/units/formatDuration';
import type { ChartFigure } from './chartFigure';
import { chartLayoutBase } from './chartLayoutBase';
import { extraTraceStyle, MARKERS_PER_TRACE, type TraceStyle } from './pointTraceStyle';

export interface ProfileOptions {
  system: UnitSystem;
  /** Stages whose end profile to draw (StageResult.index); all stages when omitted. */
  stageIndices?: readonly number[];
}

/** Profile traces in time order: dark to light along one hue, each with its own dash and marker. */
const PROFILE_STYLES: TraceStyle[] = [
  { colour: '#0f2f57', dash: 'solid', marker: 'circle' },
  { colour: '#2a5f9e', dash: 'dash', marker: 'square' },
  { colour: '#4f8cc9', dash: 'dot', marker: 'diamond' },
  { colour: '#86b4e0', dash: 'dashdot', marker: 'triangle-up' },
];

function profileStyle(i: number): TraceStyle {
  return i < PROFILE_STYLES.length ? PROFILE_STYLES[i] : extraTraceStyle(i - PROFILE_STYLES.length);
}

export function profileFigure(result: PlanResult, options: ProfileOptions): ChartFigure {
  const { system } = options;
  const temperature = displayUnit('temperature', system);
  const length = displayUnit('length', system);
  const wanted = options.stageIndices ? new Set(options.stageIndices) : null;
  const stages = result.stages.filter((s) => (wanted ? wanted.has(s.index) : true) && s.endProfile.positionM.length > 0);
  const centreLabel = result.points.find((p) => p.id === 'centre')?.label ?? 'centre';

  const data: Data[] = stages.map((stage, i) => {
    const style = profileStyle(i);
    const endS = stage.startTimeS + stage.durationS;
    const name = `end of ${stage.index + 1} ${stage.name} (${formatDuration(endS)})`;
    const { positionM, temperatureK } = stage.endProfile;
    return {
      type: 'scatter', mode: 'lines+markers', name,
      x: positionM.map((m) => length.fromSI(m)), y: temperatureK.map((k) => temperature.fromSI(k)),
      text: positionM.map((m, j) => `${name}<br>${formatQuantity('length', m, system)} from ${centreLabel}: ${formatQuantity('temperature', temperatureK[j], system)}`),
      hovertemplate: '%{text}<extra></extra>',
      line: { color: style.colour, dash: style.dash, width: 2 },
      marker: { symbol: style.marker, size: 7, color: style.colour, maxdisplayed: MARKERS_PER_TRACE },
    } satisfies Data;
  });

  const base = chartLayoutBase(`Distance from ${centreLabel} (${length.symbol})`, `Temperature (${temperature.symbol})`, 'above');
  return { data, layout: { ...base, xaxis: { ...base.xaxis, rangemode: 'tozero' } } };
}
