// The charts of the main plan's latest result, from the charts feature. The temperature chart draws
// first; the two smaller charts follow at lower priority (useDeferredValue), so an edit's main curve
// is on screen as soon as possible.
import { useDeferredValue, useMemo } from 'react';
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
  // Targets change only when an end condition does; keyed by value so an edit of h does not redraw the chart before its result.
  const targetsKey = JSON.stringify(planChartTargets(plan));
  const targets = useMemo(() => JSON.parse(targetsKey) as ReturnType<typeof planChartTargets>, [targetsKey]);
  const later = useDeferredValue(result);
  return (
    <section className="panel" aria-labelledby="curves-heading">
      <h2 id="curves-heading">Curves</h2>
      {result === null ? (
        <p className="stage-muted">The curves appear when the first results arrive.</p>
      ) : (
        <>
          <TemperatureHistoryChart result={result} system={system} targets={targets} heightPx={HISTORY_HEIGHT_PX} />
          {later && (
            <div className="chart-pair">
              <ProfileChart result={later} system={system} heightPx={SMALL_CHART_HEIGHT_PX} />
              <CoolingRateChart result={later} system={system} heightPx={SMALL_CHART_HEIGHT_PX} />
            </div>
          )}
        </>
      )}
    </section>
  );
}
