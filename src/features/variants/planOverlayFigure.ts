// The whole-plan temperature chart with every variant's centre and surface drawn over it:
// the figure the variants screen, the stage sheet and the PNG/SVG export all use.
import type { PlanDocument } from '@/schema/planDocument';
import type { PlanResult } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import type { ChartFigure } from '@/features/charts/chartFigure';
import { temperatureHistoryFigure } from '@/features/charts/temperatureHistoryFigure';
import { planChartTargets } from '@/features/charts/planChartTargets';
import { suggestedTimeAxis } from '@/features/charts/suggestedTimeAxis';
import { MAIN_PLAN_ID } from '@/state/connectEngine';
import { variantOverlaySeries } from './variantOverlaySeries';

export function planOverlayFigure(document: PlanDocument, results: Record<string, PlanResult>, system: UnitSystem): ChartFigure | null {
  const main = results[MAIN_PLAN_ID];
  if (!main) return null;
  const extraSeries = variantOverlaySeries(document.variants.map((v) => ({ name: v.name, result: results[v.id] })));
  // Paper has no axis switch: the sheet and the exports take the axis the plan reads best on.
  return temperatureHistoryFigure(main, { system, targets: planChartTargets(document.main), extraSeries, timeAxis: suggestedTimeAxis(main) });
}
