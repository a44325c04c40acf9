// Temperature against distance from the centre at the end of each stage. Props in, chart out.
import { useMemo } from 'react';
import type { PlanResult } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import { PlotlyChart } from './PlotlyChart';
import { profileFigure } from './profileFigure';

export interface ProfileChartProps {
  result: PlanResult;
  system: UnitSystem;
  stageIndices?: readonly number[];
  heightPx?: number;
}

export function ProfileChart({ result, system, stageIndices, heightPx }: ProfileChartProps) {
  const figure = useMemo(() => profileFigure(result, { system, stageIndices }), [result, system, stageIndices]);
  return <PlotlyChart figure={figure} label={`Temperature profiles at stage ends for ${result.planName}`} heightPx={heightPx} />;
}
