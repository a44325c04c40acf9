// Cautions the library entries of a plan carry (e.g. a medium's fire or food-safety notes), each once,
// leaving out those the sheet prints anyway (STAGE_SHEET_CAUTIONS).
import type { PlanK } from '@/schema/planSchema';
import { builtInMaterial, builtInMedium } from '@/library/builtInLibrary';
import { STAGE_SHEET_CAUTIONS } from '@/library/cautions';

export function sheetEntryCautions(plans: readonly PlanK[]): string[] {
  const cautions = plans.flatMap((plan) => [
    ...(plan.part.material.libraryId ? (builtInMaterial(plan.part.material.libraryId)?.cautions ?? []) : []),
    ...plan.stages.flatMap((s) => (s.medium.libraryId ? (builtInMedium(s.medium.libraryId)?.cautions ?? []) : [])),
  ]);
  const general = new Set(STAGE_SHEET_CAUTIONS.map((c) => c.text));
  return [...new Set(cautions)].filter((c) => !general.has(c));
}
