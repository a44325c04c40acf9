// Temperature against time for the whole plan. Props in, chart out.
import { useMemo } from 'react';
import type { PlanResult } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import type { ChartTarget, ExtraSeries } from './chartTarget';
import { PlotlyChart } from './PlotlyChart';
import { temperatureHistoryFigure } from './temperatureHistoryFigure';

export interface TemperatureHistoryChartProps {
  result: PlanResult;
  system: UnitSystem;
  targets?: readonly ChartTarget[];
  extraSeries?: readonly ExtraSeries[];
  heightPx?: number;
}

export function TemperatureHistoryChart({ result, system, targets, extraSeries, heightPx }: TemperatureHistoryChartProps) {
  const figure = useMemo(() => temperatureHistoryFigure(result, { system, targets, extraSeries }), [result, system, targets, extraSeries]);
  return <PlotlyChart figure={figure} label={`Temperature against time for ${result.planName}`} heightPx={heightPx} />;
}
