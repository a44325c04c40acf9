// What the autosave keeps in localStorage: the document as a plan file in kelvin (the same door,
// planFileFromText -> parsePlan, reads it back) and the unit system beside it.
import { formatPlanIssues } from '@/schema/parsePlan';
import { planFileFromText } from '@/schema/planFileFromText';
import { planFileToText } from '@/schema/planFileToText';
import type { PlanDocument } from '@/schema/planDocument';
import type { UnitSystem } from '@/features/units/unitSystem';

export const SAVED_DOCUMENT_KEY = 'coolstage.workbench.document';
export const SAVED_UNIT_SYSTEM_KEY = 'coolstage.workbench.unitSystem';

export interface SavedWorkbench {
  document: PlanDocument;
  unitSystem: UnitSystem;
}

export function writeSavedWorkbench(storage: Pick<Storage, 'setItem'>, saved: SavedWorkbench): void {
  storage.setItem(SAVED_DOCUMENT_KEY, planFileToText(saved.document, 'K'));
  storage.setItem(SAVED_UNIT_SYSTEM_KEY, saved.unitSystem);
}

export type LoadOutcome = { document: PlanDocument | null; unitSystem: UnitSystem; notice: string | null };

/** Never throws: nothing saved gives null, a damaged save gives null plus a notice saying what was wrong. */
export function readSavedWorkbench(storage: Pick<Storage, 'getItem'>): LoadOutcome {
  let text: string | null = null;
  let unitText: string | null = null;
  try {
    text = storage.getItem(SAVED_DOCUMENT_KEY);
    unitText = storage.getItem(SAVED_UNIT_SYSTEM_KEY);
  } catch {
    return { document: null, unitSystem: 'si', notice: 'This browser does not allow the workbench to read its saved plan (storage is blocked), so the demo plan was opened and edits will not be kept.' };
  }
  const unitSystem: UnitSystem = unitText === 'us' ? 'us' : 'si';
  if (text === null) return { document: null, unitSystem, notice: null };
  const outcome = planFileFromText(text);
  if (!outcome.ok) {
    return { document: null, unitSystem, notice: `The plan saved in this browser is damaged, so the demo plan was opened instead. ${formatPlanIssues(outcome.issues.slice(0, 3))}` };
  }
  return { document: outcome.document, unitSystem, notice: null };
}
