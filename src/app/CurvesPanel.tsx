// The charts of the main plan's latest result, from the charts feature.
import { useMemo } from 'react';
import { planChartTargets } from '@/features/charts/planChartTargets';
import { TemperatureHistoryChart } from '@/features/charts/TemperatureHistoryChart';
import { ProfileChart } from '@/features/charts/ProfileChart';
import { CoolingRateChart } from '@/features/charts/CoolingRateChart';
import { MAIN_PLAN_ID } from '@/state/connectEngine';
import { useAppStore } from '@/state/useAppStore';
import { useSameCurvesResult } from './useSameCurvesResult';

const HISTORY_HEIGHT_PX = 340;
const SMALL_CHART_HEIGHT_PX = 260;

export function CurvesPanel() {
  const result = useSameCurvesResult(useAppStore((s) => s.results[MAIN_PLAN_ID] ?? null));
  const plan = useAppStore((s) => s.document.main);
  const system = useAppStore((s) => s.unitSystem);
  const targets = useMemo(() => planChartTargets(plan), [plan]);
  return (
    <section className="panel" aria-labelledby="curves-heading">
      <h2 id="curves-heading">Curves</h2>
      {result === null ? (
        <p className="stage-muted">The curves appear when the first results arrive.</p>
      ) : (
        <>
          <TemperatureHistoryChart result={result} system={system} targets={targets} heightPx={HISTORY_HEIGHT_PX} />
          <div className="chart-pair">
            <ProfileChart result={result} system={system} heightPx={SMALL_CHART_HEIGHT_PX} />
            <CoolingRateChart result={result} system={system} heightPx={SMALL_CHART_HEIGHT_PX} />
          </div>
        </>
      )}
    </section>
  );
}
