// Turning library entries into the plan's Material and Medium, in kelvin (plans inside the app
// are held in kelvin). The library id and the source travel along so a stage sheet can say
// where each number came from.
import type { HeatTransfer, Material, Medium } from '@/schema/planSchema';
import { celsiusToKelvin as toKelvin } from '@/schema/planTemperatures';
import type { MaterialEntry, MediumEntry } from './libraryEntrySchema';


const rowsToKelvin = (rows: ReadonlyArray<readonly [number, number]>): [number, number][] => rows.map(([c, v]) => [toKelvin(c), v]);

export function materialFromLibrary(entry: MaterialEntry): Material {
  return {
    name: entry.name,
    // The entry schema caps a source at the plan's 400 characters, so it fits as it is.
    source: entry.source,
    libraryId: entry.id,
    conductivityWPerMK: { table: rowsToKelvin(entry.conductivityWPerMK) },
    densityKgPerM3: { table: rowsToKelvin(entry.densityKgPerM3) },
    specificHeatJPerKgK: { table: rowsToKelvin(entry.specificHeatJPerKgK) },
    surfaceEmissivity: entry.emissivity.suggested,
  };
}

export interface MediumOptions {
  /** Bath or ambient temperature, degC; the entry's suggested value when omitted. */
  temperatureC?: number;
  /**
   * 'constant' (default) uses one h; 'boiling-curve' uses the entry's illustrative h(surface T)
   * table and is only possible for entries that carry one.
   */
  heatTransfer?: 'constant' | 'boiling-curve';
  /** Constant h, W/m2 K; the entry's suggested value when omitted. */
  hWPerM2K?: number;
  /** Radiation on or off; on by default where the entry says radiation matters. */
  radiation?: boolean;
  /** Part surface emissivity; the material's suggested emissivity when omitted. */
  emissivity?: number;
  /** The part's material, whose suggested emissivity is used when radiation is on. */
  material?: MaterialEntry;
}

export type MediumConversion = { ok: true; medium: Medium } | { ok: false; message: string };

export function mediumFromLibrary(entry: MediumEntry, options: MediumOptions = {}): MediumConversion {
  const temperatureC = options.temperatureC ?? entry.temperatureC.suggested;
  let heatTransfer: HeatTransfer;
  if (options.heatTransfer === 'boiling-curve') {
    if (!entry.boilingCurve) return { ok: false, message: `"${entry.name}" has no boiling curve; use a constant h instead.` };
    heatTransfer = { kind: 'surface-table', rows: rowsToKelvin(entry.boilingCurve.hWPerM2KBySurfaceC) };
  } else {
    heatTransfer = { kind: 'constant', hWPerM2K: options.hWPerM2K ?? entry.hWPerM2K.suggested };
  }
  const medium: Medium = { name: entry.name, libraryId: entry.id, temperature: toKelvin(temperatureC), heatTransfer };
  if (options.radiation ?? entry.radiationMatters) {
    const emissivity = options.emissivity ?? options.material?.emissivity.suggested;
    if (emissivity === undefined) return { ok: false, message: `Radiation is on for "${entry.name}" but no emissivity is known: pick the part's material or give an emissivity.` };
    medium.radiation = { emissivity };
  }
  return { ok: true, medium };
}
