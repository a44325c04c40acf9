// The door for user-added library entries (from a form or a file): a value in, a checked entry or
// field-by-field issues out. Built-in entries are trusted; everything a user brings passes here once.
import type { z } from 'zod';
import { materialEntrySchema, mediumEntrySchema, type MaterialEntry, type MediumEntry } from './libraryEntrySchema';

export type LibraryEntryIssue = { path: string; message: string };
export type LibraryEntryOutcome<E> = { ok: true; entry: E } | { ok: false; issues: LibraryEntryIssue[] };

/** A zod issue path as text, e.g. "emissivity.suggested" or "conductivityWPerMK[1][0]"; `root` names the empty path. */
export function issuePath(path: readonly PropertyKey[], root: string): string {
  return path.length === 0 ? root : path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '');
}

function parseWith<E>(schema: z.ZodType<E>, data: unknown, reservedIds: ReadonlySet<string>): LibraryEntryOutcome<E> {
  const parsed = schema.safeParse(data);
  if (!parsed.success) return { ok: false, issues: parsed.error.issues.map((i) => ({ path: issuePath(i.path, '(entry)'), message: i.message })) };
  const id = (parsed.data as { id: string }).id;
  if (reservedIds.has(id)) return { ok: false, issues: [{ path: 'id', message: `id "${id}" is already taken; choose another` }] };
  return { ok: true, entry: parsed.data };
}

/** `reservedIds`: ids already in use (the built-in entries and the user's other entries). */
export function parseMaterialEntry(data: unknown, reservedIds: ReadonlySet<string> = new Set()): LibraryEntryOutcome<MaterialEntry> {
  return parseWith(materialEntrySchema, data, reservedIds);
}

export function parseMediumEntry(data: unknown, reservedIds: ReadonlySet<string> = new Set()): LibraryEntryOutcome<MediumEntry> {
  return parseWith(mediumEntrySchema, data, reservedIds);
}
