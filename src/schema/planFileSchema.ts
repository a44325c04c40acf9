// The envelope of a plan file at the current version (2): the main plan, its variants and the
// stage sheet's title block. The plan bodies inside are checked by the single-plan door
// (parsePlan), so that a plan is validated by exactly one schema wherever it comes from.
//
// Version history (see docs/file-format.md and planFileMigrations.ts):
//   1  a single plan, body at the top level (planSchema.ts, PLAN_VERSION).
//   2  { main, variants[], sheet }, bodies without format/version/unit of their own.
import { z } from 'zod';
import { PLAN_FORMAT } from './planSchema';

export const PLAN_FILE_VERSION = 2;
/** Main plan plus variants stay within the worker's 20 plans per run (src/worker/engineMessages.ts). */
export const MAX_VARIANTS = 19;

const text = (what: string, max: number) => z.string({ error: `${what} must be text` }).max(max, `${what} may be at most ${max} characters`);

export const variantIdSchema = z
  .string({ error: 'id must be text' })
  .regex(/^[A-Za-z0-9_-]{1,40}$/, 'id must be 1 to 40 letters, digits, "-" or "_"')
  // Results are filed by plan id, and the main plan's id is "main" (src/state/connectEngine.ts).
  .refine((id) => id !== 'main', 'id "main" is kept for the main plan');

export const sheetMetaSchema = z
  .object({
    revision: text('revision', 40).default(''),
    preparedBy: text('preparedBy', 120).default(''),
    checkedBy: text('checkedBy', 120).default(''),
    date: text('date', 40).default(''),
  })
  .strict();

const variantEnvelopeSchema = z
  .object({
    id: variantIdSchema,
    name: z.string({ error: 'name must be text' }).min(1, 'variant name is empty').max(120, 'variant name may be at most 120 characters'),
    /** A plan body: checked by parsePlan. */
    plan: z.record(z.string(), z.unknown(), { error: 'plan must be an object' }),
  })
  .strict();

export const planFileSchema = z
  .object({
    format: z.literal(PLAN_FORMAT, { error: `format must be "${PLAN_FORMAT}"` }),
    version: z.literal(PLAN_FILE_VERSION, { error: `version must be ${PLAN_FILE_VERSION}` }),
    temperatureUnit: z.enum(['degC', 'K'], { error: 'temperatureUnit must be "degC" or "K"' }),
    /** A plan body: checked by parsePlan. */
    main: z.record(z.string(), z.unknown(), { error: 'main must be an object (the main plan)' }),
    variants: z
      .array(variantEnvelopeSchema, { error: 'variants must be a list' })
      .max(MAX_VARIANTS, `a file may hold at most ${MAX_VARIANTS} variants`)
      .superRefine((vs, ctx) => {
        const seen = new Set<string>();
        vs.forEach((v, i) => {
          if (seen.has(v.id)) ctx.addIssue({ code: 'custom', path: [i, 'id'], message: `id "${v.id}" is used by another variant` });
          seen.add(v.id);
        });
      })
      .default([]),
    sheet: sheetMetaSchema.default({ revision: '', preparedBy: '', checkedBy: '', date: '' }),
  })
  .strict();

export type PlanFileEnvelope = z.infer<typeof planFileSchema>;
