// Where each stage's heat-transfer numbers come from, for the sheet: the library entry's source for a
// constant h, its curve label for an h(surface T) table, or "as entered" for a medium typed in by hand.
import type { PlanK } from '@/schema/planSchema';
import { builtInMedium } from '@/library/builtInLibrary';

export function sheetMediaSources(plan: PlanK): string[] {
  return plan.stages.map((stage, i) => {
    const entry = stage.medium.libraryId ? builtInMedium(stage.medium.libraryId) : undefined;
    const what = stage.medium.heatTransfer.kind === 'constant' ? 'h' : 'h(surface T)';
    const source = !entry
      ? 'as entered in the plan (user data)'
      : stage.medium.heatTransfer.kind === 'surface-table'
        ? (entry.boilingCurve?.label ?? 'as entered in the plan (user data)')
        : `library “${entry.name}”: ${entry.hWPerM2K.source}`;
    return `Stage ${i + 1} (${stage.medium.name}), ${what}: ${source}`;
  });
}
