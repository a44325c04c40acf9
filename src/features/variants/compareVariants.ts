// The comparison of a plan with its variants: one column per plan, one row per figure. Every
// number is read from the engine's PlanResult; the only arithmetic is picking the largest
// figure over the stages and adding the stages' heat, which the result reports per stage.
import type { MethodId } from '@/engine/methods/stageProblem';
import type { PlanResult } from '@/engine/plan/planResult';
import type { Geometry } from '@/engine/geometry/geometry';

export interface ComparedStage {
  name: string;
  durationS: number;
  method: MethodId;
}

export interface ComparedPlan {
  id: string;
  name: string;
  /** Null while the engine has not answered for this plan. */
  computed: {
    stages: ComparedStage[];
    totalDurationS: number;
    endCentreK: number | null;
    endSurfaceK: number | null;
    endMeanK: number | null;
    maxSurfaceCoolingRateKPerS: number;
    maxCentreSurfaceDifferenceK: number;
    heatRemovedJ: number;
    heatBasis: Geometry['basis'];
    methods: MethodId[];
    /** The stage that failed, in words; later stages were not run. */
    failure: string | null;
    warningCount: number;
  } | null;
}

export interface VariantComparison {
  plans: ComparedPlan[];
  /** Rows needed for stage durations: the longest chain among the plans. */
  stageRowCount: number;
}

export function compareVariants(entries: { id: string; name: string; result: PlanResult | undefined }[]): VariantComparison {
  const plans = entries.map(({ id, name, result }): ComparedPlan => {
    if (!result) return { id, name, computed: null };
    const last = result.stages.at(-1);
    return {
      id,
      name,
      computed: {
        stages: result.stages.map((s) => ({ name: s.name, durationS: s.durationS, method: s.method })),
        totalDurationS: result.totalDurationS,
        endCentreK: last?.endK.centre ?? null,
        endSurfaceK: last?.endK.surface ?? null,
        endMeanK: last?.endK.mean ?? null,
        maxSurfaceCoolingRateKPerS: Math.max(...result.stages.map((s) => s.maxSurfaceCoolingRateKPerS)),
        maxCentreSurfaceDifferenceK: Math.max(...result.stages.map((s) => s.maxCentreSurfaceDifferenceK)),
        heatRemovedJ: result.stages.reduce((sum, s) => sum + s.heatRemovedJ, 0),
        heatBasis: result.geometry.basis,
        methods: [...new Set(result.stages.map((s) => s.method))],
        failure: result.failure ? `stage ${result.failure.index + 1} (${result.failure.name}): ${result.failure.message}` : null,
        warningCount: result.warnings.length + result.stages.reduce((n, s) => n + s.warnings.length, 0),
      },
    };
  });
  return { plans, stageRowCount: Math.max(0, ...plans.map((p) => p.computed?.stages.length ?? 0)) };
}
