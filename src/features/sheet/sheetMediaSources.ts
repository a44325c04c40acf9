// Where each stage's heat-transfer numbers come from, for the sheet: the library entry's source for a
// constant h, its curve label for an h(surface T) table, or "as entered" for a medium typed in by hand.
// Stages with the same medium and source share one line ("Stages 1–3, 5 (still air), h: ...").
import type { PlanK } from '@/schema/planSchema';
import { builtInMedium } from '@/library/builtInLibrary';

/** "1–3, 5" from [1, 2, 3, 5]. */
function stageRuns(numbers: number[]): string {
  const runs: string[] = [];
  for (let i = 0; i < numbers.length; ) {
    let j = i;
    while (j + 1 < numbers.length && numbers[j + 1] === numbers[j] + 1) j += 1;
    runs.push(j > i ? `${numbers[i]}–${numbers[j]}` : String(numbers[i]));
    i = j + 1;
  }
  return runs.join(', ');
}

export function sheetMediaSources(plan: PlanK): string[] {
  const lines = new Map<string, number[]>();
  plan.stages.forEach((stage, i) => {
    const entry = stage.medium.libraryId ? builtInMedium(stage.medium.libraryId) : undefined;
    const what = stage.medium.heatTransfer.kind === 'constant' ? 'h' : 'h(surface T)';
    const source = !entry
      ? 'as entered in the plan (user data)'
      : stage.medium.heatTransfer.kind === 'surface-table'
        ? (entry.boilingCurve?.label ?? 'as entered in the plan (user data)')
        : `library “${entry.name}”: ${entry.hWPerM2K.source}`;
    const key = `(${stage.medium.name}), ${what}: ${source}`;
    lines.set(key, [...(lines.get(key) ?? []), i + 1]);
  });
  return [...lines].map(([text, stages]) => `${stages.length > 1 ? 'Stages' : 'Stage'} ${stageRuns(stages)} ${text}`);
}
