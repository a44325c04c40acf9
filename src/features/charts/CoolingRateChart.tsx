// Cooling rate against temperature at the centre and surface. Props in, chart out; the rates are a
// display derivative of the sampled curves (see coolingRateOfSamples), said so under the chart.
import { useMemo } from 'react';
import type { PlanResult } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import { PlotlyChart } from './PlotlyChart';
import { coolingRateFigure } from './coolingRateFigure';

export interface CoolingRateChartProps {
  result: PlanResult;
  system: UnitSystem;
  heightPx?: number;
}

export function CoolingRateChart({ result, system, heightPx }: CoolingRateChartProps) {
  const figure = useMemo(() => coolingRateFigure(result, { system }), [result, system]);
  return (
    <div className="cooling-rate-chart">
      <PlotlyChart figure={figure} label={`Cooling rate against temperature for ${result.planName}`} heightPx={heightPx} />
      <p className="plotly-chart__note">
        Rates are differences of the sampled curves shown here, for reading only; the engine's largest surface rate per stage is in the method table.
      </p>
    </div>
  );
}
