// The shape of a library entry (a material or a quench/cooling medium) and its zod schema.
// This is the edge for user-added entries from a form or a file; the built-in entries are
// written against the same types and checked against the schema in the unit tests.
// Library tables are in degC (as people read handbooks); libraryToPlan turns them into kelvin.
import { z } from 'zod';

const text = (what: string, max: number) => z.string({ error: `${what} must be text` }).trim().min(1, `${what} is empty`).max(max, `${what} may be at most ${max} characters`);
const number = (what: string) => z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be finite`);
const positive = (what: string) => number(what).refine((v) => v > 0, `${what} must be greater than zero`);

/** Coldest temperature a table may name, degC: absolute zero. */
const ABSOLUTE_ZERO_C = -273.15;

/** Rows of [temperature degC, value]; temperatures rise strictly, values are positive. */
const rowsByCelsius = (what: string, valueUnit: string) =>
  z
    .array(z.tuple([number(`${what} temperature (degC)`).refine((t) => t > ABSOLUTE_ZERO_C, `${what} temperature must be above -273.15 degC`), positive(`${what} (${valueUnit})`)]), {
      error: `${what} must be a list of [temperature degC, value in ${valueUnit}] pairs`,
    })
    .min(2, `${what} needs at least two rows`)
    .max(200, `${what} may have at most 200 rows`)
    .refine((rows) => rows.every((r, i) => i === 0 || r[0] > rows[i - 1][0]), `${what} temperatures must rise strictly from row to row`);

/** A low-high band with a suggested value inside it. */
const band = (what: string, lowest: number, highest: number) =>
  z
    .object({
      min: number(`${what} min`).refine((v) => v >= lowest && v <= highest, `${what} min must lie between ${lowest} and ${highest}`),
      max: number(`${what} max`).refine((v) => v >= lowest && v <= highest, `${what} max must lie between ${lowest} and ${highest}`),
      suggested: number(`${what} suggested`),
      /** Where the band comes from: a named table, "common practice", or "user data". */
      source: text(`${what} source`, 400),
    })
    .strict()
    .refine((b) => b.min <= b.max, { message: `${what} min must not exceed max`, path: ['max'] })
    .refine((b) => b.suggested >= b.min && b.suggested <= b.max, { message: `${what} suggested value must lie inside [min, max]`, path: ['suggested'] });

const id = z
  .string({ error: 'id must be text' })
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'id must be lower-case letters and digits joined by single hyphens, e.g. "my-tool-steel"')
  .max(80, 'id may be at most 80 characters');

export const materialEntrySchema = z
  .object({
    id,
    name: text('name', 120),
    description: text('description', 600),
    /** The published source of the property tables, with "(from memory)" where so, or "user data". */
    source: text('source', 400),
    conductivityWPerMK: rowsByCelsius('conductivity', 'W/m K'),
    densityKgPerM3: rowsByCelsius('density', 'kg/m3'),
    specificHeatJPerKgK: rowsByCelsius('specific heat', 'J/kg K'),
    /** Total hemispherical emissivity of the part's surface as usually found in the shop. */
    emissivity: band('emissivity', 0.01, 1),
    /** Remarks on how to read the data (e.g. effective specific heat through a transformation). */
    notes: z.array(text('note', 600)).max(10).default([]),
    /** Cautions that come with this material (e.g. food safety). */
    cautions: z.array(text('caution', 600)).max(10).default([]),
  })
  .strict();

export const boilingCurveSchema = z
  .object({
    /** Says that the curve is an illustrative shape; shown next to the curve wherever it is used. */
    label: text('boiling curve label', 400),
    /** Bath temperature the shape was drawn for, degC. */
    drawnForBathC: number('boiling curve bath temperature'),
    /** Below this surface temperature the curve is single-phase convection, degC. */
    convectionBelowC: number('boiling curve convection limit'),
    /** Above this surface temperature the curve is film (vapour blanket) boiling, degC. */
    filmAboveC: number('boiling curve film limit'),
    /** [surface temperature degC, h W/m2 K] rows. */
    hWPerM2KBySurfaceC: rowsByCelsius('boiling curve', 'W/m2 K'),
  })
  .strict()
  .refine((c) => c.convectionBelowC < c.filmAboveC, { message: 'boiling curve convection limit must lie below its film limit', path: ['filmAboveC'] });

export const mediumEntrySchema = z
  .object({
    id,
    name: text('name', 120),
    description: text('description', 600),
    phase: z.enum(['gas', 'liquid'], { error: 'phase must be "gas" or "liquid"' }),
    /** Usual bath or ambient temperature, degC. */
    temperatureC: band('temperature (degC)', -50, 400),
    /** Typical effective heat transfer coefficient, W/m2 K, for the constant-h option. */
    hWPerM2K: band('h (W/m2 K)', 0.1, 100_000),
    /** Whether surface radiation matters next to convection (true for gases around hot parts). */
    radiationMatters: z.boolean({ error: 'radiationMatters must be true or false' }),
    /** h as a function of surface temperature; liquids that boil at the part surface carry one. */
    boilingCurve: boilingCurveSchema.optional(),
    /** Short safety sentences for the stage sheet; defer to site procedures and local codes. */
    cautions: z.array(text('caution', 600)).min(1, 'a medium needs at least one caution').max(10),
  })
  .strict();

export type MaterialEntry = z.infer<typeof materialEntrySchema>;
export type MediumEntry = z.infer<typeof mediumEntrySchema>;
export type BoilingCurve = z.infer<typeof boilingCurveSchema>;
