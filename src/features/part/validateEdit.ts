// The form edge: an edited piece of the plan is checked with its zod schema before it is
// committed; a failure becomes one sentence naming the field, and the plan keeps its last good value.
import type { z } from 'zod';

export type EditCheck<T> = { ok: true; value: T } | { ok: false; message: string };

export function validateEdit<S extends z.ZodType>(schema: S, candidate: unknown, fieldLabel: string): EditCheck<z.output<S>> {
  const parsed = schema.safeParse(candidate);
  if (parsed.success) return { ok: true, value: parsed.data };
  const first = parsed.error.issues[0];
  return { ok: false, message: `${fieldLabel}: ${first?.message ?? 'not accepted'}.` };
}
