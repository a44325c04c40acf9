// Cooling rate against temperature for the centre and the surface, temperature upward and rate across,
// the way quench cooling curves are commonly read (ISO 9950, Industrial quenching oils - Determination of
// cooling characteristics, plots rate against temperature) (from memory).
// The rates are a display derivative of the sampled curves (coolingRateOfSamples), stage by stage with a
// break at each stage boundary, where the surface condition jumps.
import type { Data } from 'plotly.js';
import type { PlanResult } from '@/engine/plan/planResult';
import type { PointId } from '@/schema/planSchema';
import type { UnitSystem } from '@/features/units/unitSystem';
import { displayUnit } from '@/features/units/quantityUnits';
import { formatQuantity } from '@/features/units/formatQuantity';
import type { ChartFigure } from './chartFigure';
import { chartLayoutBase } from './chartLayoutBase';
import { coolingRateOfSamples } from './coolingRateOfSamples';
import { MARKERS_PER_TRACE, pointTraceStyle } from './pointTraceStyle';

export interface CoolingRateOptions {
  system: UnitSystem;
  /** Points to draw; centre and surface when omitted. */
  points?: readonly PointId[];
}

const DEFAULT_POINTS: readonly PointId[] = ['centre', 'surface'];

export function coolingRateFigure(result: PlanResult, options: CoolingRateOptions): ChartFigure {
  const { system } = options;
  const temperature = displayUnit('temperature', system);
  const rate = displayUnit('coolingRate', system);
  const data: Data[] = (options.points ?? DEFAULT_POINTS).flatMap((id) => {
    const label = result.points.find((p) => p.id === id)?.label;
    if (!label) return [];
    const x: (number | null)[] = [];
    const y: (number | null)[] = [];
    const text: string[] = [];
    for (const stage of result.stages) {
      const curve = stage.curves.temperaturesK[id];
      if (!curve) continue;
      if (x.length > 0) {
        x.push(null);
        y.push(null);
        text.push('');
      }
      const rates = coolingRateOfSamples(stage.curves.timeS, curve);
      rates.forEach((r, i) => {
        const finite = Number.isFinite(r);
        x.push(finite ? rate.fromSI(r) : null);
        y.push(finite ? temperature.fromSI(curve[i]) : null);
        text.push(`${label}: ${formatQuantity('coolingRate', r, system)} at ${formatQuantity('temperature', curve[i], system)}<br>${stage.index + 1} ${stage.name}`);
      });
    }
    if (x.length === 0) return [];
    const style = pointTraceStyle(id);
    return [{
      type: 'scatter', mode: 'lines+markers', name: label, x, y, text, hovertemplate: '%{text}<extra></extra>',
      line: { color: style.colour, dash: style.dash, width: 2 },
      marker: { symbol: style.marker, size: 7, color: style.colour, maxdisplayed: MARKERS_PER_TRACE },
      connectgaps: false,
    } satisfies Data];
  });
  return { data, layout: chartLayoutBase(`Cooling rate (${rate.symbol})`, `Temperature (${temperature.symbol})`, 'above') };
}
