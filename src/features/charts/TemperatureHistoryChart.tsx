// Temperature against time for the whole plan, with a linear / log time-axis switch (view state only,
// starting on the suggested axis).
// Props in, chart out.
import { useId, useMemo, useState } from 'react';
import type { PlanResult } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import type { ChartTarget, ExtraSeries } from './chartTarget';
import { PlotlyChart } from './PlotlyChart';
import { temperatureHistoryFigure, type TimeAxisKind } from './temperatureHistoryFigure';
import { suggestedTimeAxis } from './suggestedTimeAxis';

export interface TemperatureHistoryChartProps {
  result: PlanResult;
  system: UnitSystem;
  targets?: readonly ChartTarget[];
  extraSeries?: readonly ExtraSeries[];
  heightPx?: number;
  /** The time axis to start on; by default log when a stage is a sliver of the plan (suggestedTimeAxis). */
  initialTimeAxis?: TimeAxisKind;
}

const TIME_AXES: { id: TimeAxisKind; label: string }[] = [
  { id: 'linear', label: 'linear' },
  { id: 'log', label: 'log' },
];

export function TemperatureHistoryChart({ result, system, targets, extraSeries, heightPx, initialTimeAxis }: TemperatureHistoryChartProps) {
  const [timeAxis, setTimeAxis] = useState<TimeAxisKind>(() => initialTimeAxis ?? suggestedTimeAxis(result));
  const name = useId();
  const figure = useMemo(() => temperatureHistoryFigure(result, { system, targets, extraSeries, timeAxis }), [result, system, targets, extraSeries, timeAxis]);
  return (
    <div className="temperature-history-chart">
      <fieldset className="plotly-chart__switch">
        <legend>Time axis</legend>
        {TIME_AXES.map((axis) => (
          <label key={axis.id}>
            <input type="radio" name={name} value={axis.id} checked={timeAxis === axis.id} onChange={() => setTimeAxis(axis.id)} /> {axis.label}
          </label>
        ))}
      </fieldset>
      <PlotlyChart figure={figure} label={`Temperature against time for ${result.planName}`} heightPx={heightPx} />
    </div>
  );
}
