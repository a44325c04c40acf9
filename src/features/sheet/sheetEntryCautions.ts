// Cautions the library entries of a plan carry (e.g. a medium's fire or food-safety notes), each once.
import type { PlanK } from '@/schema/planSchema';
import { builtInMaterial, builtInMedium } from '@/library/builtInLibrary';

export function sheetEntryCautions(plans: readonly PlanK[]): string[] {
  const cautions = plans.flatMap((plan) => [
    ...(plan.part.material.libraryId ? (builtInMaterial(plan.part.material.libraryId)?.cautions ?? []) : []),
    ...plan.stages.flatMap((s) => (s.medium.libraryId ? (builtInMedium(s.medium.libraryId)?.cautions ?? []) : [])),
  ]);
  return [...new Set(cautions)];
}
