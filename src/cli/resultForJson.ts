// The JSON the headless command prints: the engine's result, SI throughout (kelvin, seconds, joules),
// with the sampled curves and end profiles only when asked for.
import type { PlanResult } from '@/engine/plan/planResult';

export const JSON_UNITS = { temperature: 'K', time: 's', length: 'm', heat: 'J (on the geometry basis)', heatTransferCoefficient: 'W/(m2 K)', coolingRate: 'K/s' };

export function resultForJson(result: PlanResult, withSeries: boolean) {
  return {
    units: JSON_UNITS,
    ...result,
    stages: result.stages.map(({ curves, endProfile, ...stage }) => (withSeries ? { ...stage, curves, endProfile } : stage)),
  };
}
