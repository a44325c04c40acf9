// The plan file: the one contract between files, links, forms, the worker and the engine.
// Every number is SI except temperatures, which are in the plan's `temperatureUnit`.
// Inside the app and the engine a plan is always held in kelvin (see toKelvinPlan).
import { z } from 'zod';

export const PLAN_FORMAT = 'coolstage-plan';
export const PLAN_VERSION = 1;

const positive = (what: string) => z.number({ error: `${what} must be a number` }).positive(`${what} must be greater than zero`);
const finite = (what: string) => z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be finite`);

/** A temperature in the plan's unit. Kelvin values must be above absolute zero (checked after conversion). */
const temperature = finite('temperature');

/** A property given as one constant or as a table of (temperature, value) pairs, temperatures ascending. */
export const propertySchema = z.union([
  positive('property value'),
  z.object({
    table: z
      .array(z.tuple([temperature, positive('table value')]), { error: 'table must be a list of [temperature, value] pairs' })
      .min(2, 'a property table needs at least two rows')
      .max(200, 'a property table may have at most 200 rows')
      .refine((rows) => rows.every((r, i) => i === 0 || r[0] > rows[i - 1][0]), 'table temperatures must rise strictly from row to row'),
  }).strict(),
]);

export const shapeSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('plate'), halfThicknessM: positive('halfThicknessM') }).strict(),
  z.object({ kind: z.literal('plate-insulated-back'), thicknessM: positive('thicknessM') }).strict(),
  z.object({ kind: z.literal('long-cylinder'), radiusM: positive('radiusM') }).strict(),
  z.object({ kind: z.literal('sphere'), radiusM: positive('radiusM') }).strict(),
  z.object({ kind: z.literal('short-cylinder'), radiusM: positive('radiusM'), halfLengthM: positive('halfLengthM') }).strict(),
  z.object({ kind: z.literal('bar'), halfWidthM: positive('halfWidthM'), halfHeightM: positive('halfHeightM') }).strict(),
  z
    .object({ kind: z.literal('block'), halfLengthM: positive('halfLengthM'), halfWidthM: positive('halfWidthM'), halfHeightM: positive('halfHeightM') })
    .strict(),
]);

export const materialSchema = z
  .object({
    name: z.string().min(1, 'material name is empty').max(120),
    /** Where the numbers come from: handbook, table, "from memory", or "user data". */
    source: z.string().max(400).default('user data'),
    libraryId: z.string().max(80).optional(),
    conductivityWPerMK: propertySchema,
    densityKgPerM3: propertySchema,
    specificHeatJPerKgK: propertySchema,
    /** Emissivity of the part's surface as it leaves the furnace; used to judge whether radiation matters in a stage that leaves it out. */
    surfaceEmissivity: z.number().gt(0, 'surfaceEmissivity must be above 0').lte(1, 'surfaceEmissivity must be at most 1').optional(),
  })
  .strict();

export const heatTransferSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('constant'), hWPerM2K: positive('hWPerM2K') }).strict(),
  /** h as a function of the surface temperature, e.g. a boiling curve: [surface temperature, h] rows. */
  z
    .object({
      kind: z.literal('surface-table'),
      rows: z
        .array(z.tuple([temperature, positive('h')]))
        .min(2, 'an h table needs at least two rows')
        .max(200)
        .refine((rows) => rows.every((r, i) => i === 0 || r[0] > rows[i - 1][0]), 'surface temperatures must rise strictly from row to row'),
    })
    .strict(),
]);

export const radiationSchema = z
  .object({
    emissivity: z.number().gt(0, 'emissivity must be above 0').lte(1, 'emissivity must be at most 1'),
    /** Temperature of the surroundings the surface sees; the medium temperature when omitted. */
    surroundingsTemperature: temperature.optional(),
  })
  .strict();

export const mediumSchema = z
  .object({
    name: z.string().min(1, 'medium name is empty').max(120),
    libraryId: z.string().max(80).optional(),
    temperature,
    heatTransfer: heatTransferSchema,
    radiation: radiationSchema.optional(),
  })
  .strict();

/** Points a plan may name. Which ones a shape has is decided by the engine's geometry (pointsOfShape). */
export const pointIdSchema = z.enum(['centre', 'surface', 'mean', 'depth', 'face-x', 'face-y', 'face-z', 'edge', 'corner']);

export const endConditionSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('duration'), seconds: positive('seconds').max(1e8, 'seconds must be below 1e8') }).strict(),
  z
    .object({
      kind: z.literal('point-temperature'),
      point: pointIdSchema,
      /** Depth below the cooled surface, for point = "depth". */
      depthM: z.number().nonnegative('depthM must not be negative').optional(),
      temperature,
    })
    .strict()
    .refine((e) => e.point !== 'depth' || e.depthM !== undefined, { message: 'depthM is required when point is "depth"', path: ['depthM'] }),
]);

export const methodChoiceSchema = z.enum(['auto', 'lumped', 'series', 'finite-volume']);

export const stageSchema = z
  .object({
    name: z.string().min(1, 'stage name is empty').max(120),
    medium: mediumSchema,
    end: endConditionSchema,
    method: methodChoiceSchema.default('auto'),
    /** Target temperatures the shop floor must meet; drawn on charts and checked. Optional. */
    note: z.string().max(1000).optional(),
  })
  .strict();

export const partSchema = z.object({ shape: shapeSchema, material: materialSchema }).strict();

export const planBodySchema = z
  .object({
    name: z.string().min(1, 'plan name is empty').max(200),
    part: partSchema,
    initialTemperature: temperature,
    stages: z.array(stageSchema).min(1, 'a plan needs at least one stage').max(50, 'a plan may have at most 50 stages'),
  })
  .strict();

export const planSchema = z
  .object({
    format: z.literal(PLAN_FORMAT, { error: `format must be "${PLAN_FORMAT}"` }),
    version: z.literal(PLAN_VERSION, { error: `version must be ${PLAN_VERSION}` }),
    temperatureUnit: z.enum(['degC', 'K'], { error: 'temperatureUnit must be "degC" or "K"' }),
  })
  .extend(planBodySchema.shape)
  .strict();

export type PropertyInput = z.infer<typeof propertySchema>;
export type Shape = z.infer<typeof shapeSchema>;
export type ShapeKind = Shape['kind'];
export type Material = z.infer<typeof materialSchema>;
export type HeatTransfer = z.infer<typeof heatTransferSchema>;
export type Radiation = z.infer<typeof radiationSchema>;
export type Medium = z.infer<typeof mediumSchema>;
export type PointId = z.infer<typeof pointIdSchema>;
export type EndCondition = z.infer<typeof endConditionSchema>;
export type MethodChoice = z.infer<typeof methodChoiceSchema>;
export type Stage = z.infer<typeof stageSchema>;
export type Part = z.infer<typeof partSchema>;
export type Plan = z.infer<typeof planSchema>;
/** A plan whose temperatures are all in kelvin: the only form the engine and the store hold. */
export type PlanK = Plan & { temperatureUnit: 'K' };
