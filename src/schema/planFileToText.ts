// Writing a PlanDocument as a version-2 plan file (see docs/file-format.md). Temperatures are
// written in the unit the user picks; planFileFromText reads them back to the same kelvin values.
import { toCelsiusPlan } from './planTemperatures';
import { PLAN_FORMAT, type PlanK } from './planSchema';
import { PLAN_FILE_VERSION } from './planFileSchema';
import { EMPTY_SHEET_META, type PlanDocument } from './planDocument';

export type FileTemperatureUnit = 'degC' | 'K';

function bodyOf(plan: PlanK, unit: FileTemperatureUnit) {
  const { name, part, initialTemperature, stages } = unit === 'degC' ? toCelsiusPlan(plan) : plan;
  return { name, part, initialTemperature, stages };
}

export function planFileToText(document: PlanDocument, unit: FileTemperatureUnit = 'degC'): string {
  const file = {
    format: PLAN_FORMAT,
    version: PLAN_FILE_VERSION,
    temperatureUnit: unit,
    main: bodyOf(document.main, unit),
    variants: document.variants.map((v) => ({ id: v.id, name: v.name, plan: bodyOf(v.plan, unit) })),
    sheet: document.sheet ?? EMPTY_SHEET_META,
  };
  return `${JSON.stringify(file, null, 2)}\n`;
}
