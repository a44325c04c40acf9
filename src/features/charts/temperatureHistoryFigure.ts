// Temperature against time for the whole plan: one trace per reported point, stage spans shaded and named,
// end-condition targets drawn, optional extra series (variants) over it. Display conversion only.
import type { Data, Shape, Annotations } from 'plotly.js';
import type { PlanResult } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import { displayUnit } from '@/features/units/quantityUnits';
import { formatQuantity } from '@/features/units/formatQuantity';
import { formatDuration } from '@/features/units/formatDuration';
import type { ChartFigure } from './chartFigure';
import type { ChartTarget, ExtraSeries } from './chartTarget';
import { chartLayoutBase } from './chartLayoutBase';
import { extraTraceStyle, MARKERS_PER_TRACE, pointTraceStyle } from './pointTraceStyle';
import { timeAxisScale } from './timeAxisScale';
import { stageLabelRows, stageLabelWidthFraction } from './stageLabelRows';

export interface TemperatureHistoryOptions {
  system: UnitSystem;
  targets?: readonly ChartTarget[];
  extraSeries?: readonly ExtraSeries[];
  /** 'log' spreads short early stages (transfer, quench) out against a long hold; t = 0 itself is not drawn there. */
  timeAxis?: TimeAxisKind;
}

export type TimeAxisKind = 'linear' | 'log';

const STAGE_SHADE = 'rgba(40, 70, 120, 0.05)';
const STAGE_LINE = '#9aa5b1';
const STAGE_LABEL_ROW_PX = 14;
const FAILURE_COLOUR = '#a3281b';
const STAGE_LABEL_TOP_PX = 12;

export function temperatureHistoryFigure(result: PlanResult, options: TemperatureHistoryOptions): ChartFigure {
  const { system } = options;
  const temperature = displayUnit('temperature', system);
  const scale = timeAxisScale(result.totalDurationS);
  const logTime = options.timeAxis === 'log';
  const toAxisTime = (s: number) => s / scale.secondsPerUnit;
  // On a log axis nothing sits at t = 0: stage bands start at the first sampled time after 0.
  const firstPositiveS = Math.min(...result.stages.flatMap((st) => st.curves.timeS.filter((t) => t > 0)), result.totalDurationS);
  const shapeTime = (s: number) => toAxisTime(logTime ? Math.max(s, firstPositiveS) : s);
  // Plotly places annotations on a log axis by the log10 of the value.
  const annotationTime = (s: number) => (logTime ? Math.log10(shapeTime(s)) : toAxisTime(s));
  const axisStart = logTime ? Math.log10(shapeTime(0)) : 0;
  const axisEnd = logTime ? Math.log10(shapeTime(result.totalDurationS)) : toAxisTime(result.totalDurationS);
  /** Where a time sits across the axis, 0 to 1, for spacing the stage names. */
  const axisFraction = (axisTime: number) => ((logTime ? Math.log10(axisTime) : axisTime) - axisStart) / Math.max(axisEnd - axisStart, Number.MIN_VALUE);
  const shown = (k: number) => formatQuantity('temperature', k, system);

  const pointTraces: Data[] = result.points.flatMap(({ id, label }) => {
    const x: number[] = [];
    const y: number[] = [];
    const text: string[] = [];
    for (const stage of result.stages) {
      const curve = stage.curves.temperaturesK[id];
      if (!curve) continue;
      stage.curves.timeS.forEach((t, i) => {
        x.push(toAxisTime(t));
        y.push(temperature.fromSI(curve[i]));
        text.push(`${label}: ${shown(curve[i])}<br>${formatDuration(t)} · ${stage.index + 1} ${stage.name}`);
      });
    }
    if (x.length === 0) return [];
    const style = pointTraceStyle(id);
    return [{
      type: 'scatter', mode: 'lines+markers', name: label, x, y, text, hovertemplate: '%{text}<extra></extra>',
      line: { color: style.colour, dash: style.dash, width: 2 },
      marker: { symbol: style.marker, size: 7, color: style.colour, maxdisplayed: MARKERS_PER_TRACE },
    } satisfies Data];
  });

  const targetTraces: Data[] = (options.targets ?? []).flatMap((target, i) => {
    const stage = result.stages.find((s) => s.index === target.stageIndex);
    if (!stage) return [];
    const pointLabel = result.points.find((p) => p.id === target.point)?.label ?? target.point;
    const where = target.point === 'depth' && target.depthM !== undefined ? `${pointLabel} at ${formatQuantity('length', target.depthM, system)}` : pointLabel;
    const style = pointTraceStyle(target.point);
    const value = temperature.fromSI(target.temperatureK);
    const label = `target: ${where} ${shown(target.temperatureK)} (${stage.index + 1} ${stage.name})`;
    return [{
      type: 'scatter', mode: 'lines+markers', name: 'stage targets', legendgroup: 'targets', showlegend: i === 0,
      x: [shapeTime(stage.startTimeS), shapeTime(stage.startTimeS + stage.durationS)], y: [value, value],
      text: [label, label], hovertemplate: '%{text}<extra></extra>',
      line: { color: style.colour, dash: 'dot', width: 1 },
      marker: { symbol: 'x-thin-open', size: [0, 12], color: style.colour, line: { width: 2, color: style.colour } },
    } satisfies Data];
  });

  const extraTraces: Data[] = (options.extraSeries ?? []).map((series, i) => {
    const style = extraTraceStyle(i);
    return {
      type: 'scatter', mode: 'lines+markers', name: series.name,
      x: series.timeS.map(toAxisTime), y: series.temperatureK.map((k) => temperature.fromSI(k)),
      text: series.temperatureK.map((k, j) => `${series.name}: ${shown(k)}<br>${formatDuration(series.timeS[j])}`),
      hovertemplate: '%{text}<extra></extra>',
      line: { color: style.colour, dash: style.dash, width: 1.5 },
      marker: { symbol: style.marker, size: 6, color: style.colour, maxdisplayed: MARKERS_PER_TRACE },
    } satisfies Data;
  });

  const shapes: Partial<Shape>[] = result.stages.flatMap((stage, i) => {
    const x0 = shapeTime(stage.startTimeS);
    const x1 = shapeTime(stage.startTimeS + stage.durationS);
    const band: Partial<Shape> = { type: 'rect', xref: 'x', yref: 'paper', x0, x1, y0: 0, y1: 1, fillcolor: i % 2 === 0 ? STAGE_SHADE : 'rgba(0,0,0,0)', line: { width: 0 }, layer: 'below' };
    const boundary: Partial<Shape> = { type: 'line', xref: 'x', yref: 'paper', x0, x1: x0, y0: 0, y1: 1, line: { color: STAGE_LINE, width: 1, dash: 'dash' }, layer: 'below' };
    return i === 0 ? [band] : [band, boundary];
  });
  const stageLabels = result.stages.map((stage) => `${stage.index + 1} ${stage.name}`);
  const rows = stageLabelRows(result.stages.map((st) => axisFraction(shapeTime(st.startTimeS))), stageLabels.map(stageLabelWidthFraction));
  const annotations: Partial<Annotations>[] = result.stages.map((stage, i) => ({
    xref: 'x', yref: 'paper', x: annotationTime(stage.startTimeS), y: 1, yshift: rows[i] * STAGE_LABEL_ROW_PX, xanchor: 'left', yanchor: 'bottom', showarrow: false,
    text: stageLabels[i], font: { size: 11, color: '#394b5e' },
  }));
  const labelRowCount = rows.length > 0 ? Math.max(...rows) + 1 : 0;
  const failure = result.failure;
  if (failure) {
    // The plan stopped: mark where, so the curves are not read as the whole plan.
    const last = result.stages[result.stages.length - 1];
    const stopS = last ? last.startTimeS + last.durationS : 0;
    shapes.push({ type: 'line', xref: 'x', yref: 'paper', x0: shapeTime(stopS), x1: shapeTime(stopS), y0: 0, y1: 1, line: { color: FAILURE_COLOUR, width: 2, dash: 'dot' } });
    annotations.push({
      xref: 'x', yref: 'paper', x: annotationTime(stopS), y: 0.5, xanchor: 'right', showarrow: false, bgcolor: 'rgba(255,255,255,0.85)',
      text: `stage ${failure.index + 1} (${failure.name}) not computed ▸`, font: { size: 11, color: FAILURE_COLOUR },
    });
  }

  const base = chartLayoutBase(`Time (${scale.symbol})`, `Temperature (${temperature.symbol})`);
  return {
    data: [...pointTraces, ...targetTraces, ...extraTraces],
    layout: {
      ...base, shapes, annotations,
      margin: { ...base.margin, t: STAGE_LABEL_TOP_PX + labelRowCount * STAGE_LABEL_ROW_PX },
      xaxis: logTime ? { ...base.xaxis, type: 'log', title: { text: `Time (${scale.symbol}, log scale)` } } : { ...base.xaxis, rangemode: 'tozero' },
    },
  };
}
