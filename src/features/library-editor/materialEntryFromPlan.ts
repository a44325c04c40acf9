// A library material entry built from the plan's material: tables turned from kelvin to degC, a
// constant written as a flat two-row table over the temperatures the plan spans. The user supplies
// the words (description, source) and the emissivity band; parseMaterialEntry checks the result.
import type { Material, PropertyInput } from '@/schema/planSchema';
import { kelvinToCelsius as toC } from '@/schema/planTemperatures';
import { idFromName } from './idFromName';


export interface MaterialWords {
  name: string;
  id: string;
  description: string;
  source: string;
  emissivity: { min: number; max: number; suggested: number; source: string };
}

export function materialWordsOf(material: Material): MaterialWords {
  const e = material.surfaceEmissivity;
  return {
    name: material.name,
    id: idFromName(`my ${material.name}`),
    description: '',
    source: material.source,
    emissivity: e === undefined ? { min: 0, max: 0, suggested: 0, source: '' } : { min: e, max: e, suggested: e, source: 'user data' },
  };
}

function rowsC(p: PropertyInput, spanK: { lowK: number; highK: number }): [number, number][] {
  return typeof p === 'number'
    ? [
        [toC(spanK.lowK), p],
        [toC(spanK.highK), p],
      ]
    : p.table.map(([k, v]) => [toC(k), v]);
}

/** The candidate entry (unchecked: parseMaterialEntry is the door). */
export function materialEntryFromPlan(material: Material, words: MaterialWords, spanK: { lowK: number; highK: number }): unknown {
  return {
    id: words.id,
    name: words.name,
    description: words.description,
    source: words.source,
    conductivityWPerMK: rowsC(material.conductivityWPerMK, spanK),
    densityKgPerM3: rowsC(material.densityKgPerM3, spanK),
    specificHeatJPerKgK: rowsC(material.specificHeatJPerKgK, spanK),
    emissivity: words.emissivity,
    notes: [],
    cautions: [],
  };
}
