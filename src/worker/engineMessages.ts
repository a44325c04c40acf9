// The messages between the UI thread and the engine worker. Requests are validated with zod
// in the worker (the edge the plans cross); replies are checked for their envelope on the UI side.
import { z } from 'zod';
import { planSchema, type PlanK } from '@/schema/planSchema';
import type { PlanResult } from '@/engine/plan/planResult';

/** Main plan plus variants: a document never holds more than this many plans. */
export const MAX_PLANS_PER_RUN = 20;

const runIdSchema = z.number().int().nonnegative();

export const engineRequestSchema = z.discriminatedUnion('kind', [
  z
    .object({
      kind: z.literal('run'),
      runId: runIdSchema,
      /** false: the quick pass (no second-method checks); true: the full, cross-checked pass. */
      crossCheck: z.boolean(),
      plans: z
        .array(z.object({ id: z.string().min(1).max(80), plan: planSchema.refine((p) => p.temperatureUnit === 'K', 'the worker takes plans in kelvin') }).strict())
        .min(1, 'a run needs at least one plan')
        .max(MAX_PLANS_PER_RUN),
    })
    .strict(),
  z.object({ kind: z.literal('cancel'), runId: runIdSchema }).strict(),
]);

export type EngineRequest =
  | { kind: 'run'; runId: number; crossCheck: boolean; plans: { id: string; plan: PlanK }[] }
  | { kind: 'cancel'; runId: number };

export interface PlanRunResult {
  id: string;
  result: PlanResult;
}

export const engineResponseSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('result'),
    runId: runIdSchema,
    /** The request's crossCheck: false for the quick pass, true for the full one. */
    complete: z.boolean(),
    elapsedMs: z.number(),
    results: z.array(z.object({ id: z.string(), result: z.custom<PlanResult>((r) => typeof r === 'object' && r !== null) })),
  }),
  z.object({ kind: z.literal('progress'), runId: runIdSchema, fraction: z.number().min(0).max(1) }),
  z.object({ kind: z.literal('cancelled'), runId: runIdSchema }),
  z.object({ kind: z.literal('error'), runId: runIdSchema.nullable(), message: z.string() }),
]);

export type EngineResponse = z.infer<typeof engineResponseSchema>;
