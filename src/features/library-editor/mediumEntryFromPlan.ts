// A library medium entry built from a stage's medium: its temperature and h become the suggested
// values (temperatures from kelvin to degC); an h table becomes the entry's boiling curve. The user
// supplies the words, the bands, and the cautions; parseMediumEntry checks the result.
import type { Medium } from '@/schema/planSchema';
import { kelvinToCelsius as toC } from '@/schema/planTemperatures';
import { DEFER_CAUTION } from '@/library/cautions';
import { idFromName } from './idFromName';


export interface MediumWords {
  name: string;
  id: string;
  description: string;
  phase: 'gas' | 'liquid';
  /** Kelvin, as the forms hold temperatures. */
  temperatureK: { min: number; max: number; suggested: number; source: string };
  hWPerM2K: { min: number; max: number; suggested: number; source: string };
  radiationMatters: boolean;
  cautions: string;
  /** For an h table: the curve's label and where convection ends and film boiling begins (kelvin). */
  curve: { label: string; convectionBelowK: number; filmAboveK: number };
}

/** Below this h a medium is taken for a gas when first saved (common practice; the user can change it). */
const GAS_H_LIMIT_W_PER_M2K = 300;

export function mediumWordsOf(medium: Medium): MediumWords {
  const ht = medium.heatTransfer;
  const hs = ht.kind === 'constant' ? [ht.hWPerM2K] : ht.rows.map((r) => r[1]);
  const rowsT = ht.kind === 'surface-table' ? ht.rows.map((r) => r[0]) : [medium.temperature];
  const hSuggested = ht.kind === 'constant' ? ht.hWPerM2K : Math.max(...hs);
  return {
    name: medium.name,
    id: idFromName(`my ${medium.name}`),
    description: '',
    phase: hSuggested < GAS_H_LIMIT_W_PER_M2K ? 'gas' : 'liquid',
    temperatureK: { min: medium.temperature, max: medium.temperature, suggested: medium.temperature, source: 'user data' },
    hWPerM2K: { min: Math.min(...hs), max: Math.max(...hs), suggested: hSuggested, source: 'user data' },
    radiationMatters: medium.radiation !== undefined,
    cautions: DEFER_CAUTION.text,
    curve: { label: 'user data: h by surface temperature as typed in a plan', convectionBelowK: Math.min(...rowsT), filmAboveK: Math.max(...rowsT) },
  };
}

const band = (b: { min: number; max: number; suggested: number; source: string }, f: (x: number) => number) => ({ min: f(b.min), max: f(b.max), suggested: f(b.suggested), source: b.source });

/** The candidate entry (unchecked: parseMediumEntry is the door). */
export function mediumEntryFromPlan(medium: Medium, words: MediumWords): unknown {
  const ht = medium.heatTransfer;
  return {
    id: words.id,
    name: words.name,
    description: words.description,
    phase: words.phase,
    temperatureC: band(words.temperatureK, toC),
    hWPerM2K: band(words.hWPerM2K, (x) => x),
    radiationMatters: words.radiationMatters,
    ...(ht.kind === 'surface-table'
      ? {
          boilingCurve: {
            label: words.curve.label,
            drawnForBathC: toC(medium.temperature),
            convectionBelowC: toC(words.curve.convectionBelowK),
            filmAboveC: toC(words.curve.filmAboveK),
            hWPerM2KBySurfaceC: ht.rows.map(([k, h]) => [toC(k), h]),
          },
        }
      : {}),
    cautions: words.cautions
      .split('\n')
      .map((c) => c.trim())
      .filter((c) => c !== ''),
  };
}
