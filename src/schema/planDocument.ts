// What the workbench holds and saves: the main plan and its variants, all in kelvin.
// The versioned file format around it (with migrations) lives beside this file (planFile*.ts).
import type { PlanK } from './planSchema';

export interface PlanVariant {
  /** Stable id, unique within the document. */
  id: string;
  name: string;
  plan: PlanK;
}

/** The title-block fields of the printed stage sheet. Free text; empty when not filled in. */
export interface PlanSheetMeta {
  revision: string;
  preparedBy: string;
  checkedBy: string;
  /** The date printed on the sheet, as the user typed it (ISO 8601 suggested). Empty: today's date is printed. */
  date: string;
}

export interface PlanDocument {
  main: PlanK;
  variants: PlanVariant[];
  /** Title block of the stage sheet; files always carry it, a new document may not have it yet. */
  sheet?: PlanSheetMeta;
}

export const EMPTY_SHEET_META: PlanSheetMeta = { revision: '', preparedBy: '', checkedBy: '', date: '' };
