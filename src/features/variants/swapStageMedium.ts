// A variant's stage with its medium taken from the library: the usual variant question
// ("still air, or an agitated bath?"). A liquid with a boiling curve gets that curve as h(Ts).
import type { PlanK } from '@/schema/planSchema';
import type { MediumEntry } from '@/library/libraryEntrySchema';
import { builtInMaterial } from '@/library/builtInLibrary';
import { mediumFromLibrary } from '@/library/libraryToPlan';

export type SwapOutcome = { ok: true; plan: PlanK } | { ok: false; message: string };

export function swapStageMedium(plan: PlanK, stageIndex: number, entry: MediumEntry): SwapOutcome {
  const stage = plan.stages[stageIndex];
  const material = plan.part.material.libraryId ? builtInMaterial(plan.part.material.libraryId) : undefined;
  const converted = mediumFromLibrary(entry, {
    heatTransfer: entry.boilingCurve ? 'boiling-curve' : 'constant',
    material,
    emissivity: material ? undefined : stage.medium.radiation?.emissivity,
  });
  if (!converted.ok) return converted;
  return { ok: true, plan: { ...plan, stages: plan.stages.map((s, i) => (i === stageIndex ? { ...s, medium: converted.medium } : s)) } };
}
