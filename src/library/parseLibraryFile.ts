// A user library file: the user's own materials and media, saved and shared as JSON text.
// Text in, checked entries or path-named issues out; ids must be unique and must not shadow
// a built-in entry.
import { z } from 'zod';
import { materialEntrySchema, mediumEntrySchema, type MaterialEntry, type MediumEntry } from './libraryEntrySchema';
import { issuePath, type LibraryEntryIssue } from './parseLibraryEntry';

export const LIBRARY_FILE_FORMAT = 'coolstage-library';
export const LIBRARY_FILE_VERSION = 1;
/** A library of a few hundred entries is well under 1 MB; anything larger is the wrong file. */
export const MAX_LIBRARY_FILE_BYTES = 1_000_000;

export const libraryFileSchema = z
  .object({
    format: z.literal(LIBRARY_FILE_FORMAT, { error: `format must be "${LIBRARY_FILE_FORMAT}"` }),
    version: z.literal(LIBRARY_FILE_VERSION, { error: `version must be ${LIBRARY_FILE_VERSION}` }),
    materials: z.array(materialEntrySchema).max(500, 'a library file may hold at most 500 materials').default([]),
    media: z.array(mediumEntrySchema).max(500, 'a library file may hold at most 500 media').default([]),
  })
  .strict();

export type LibraryFile = z.infer<typeof libraryFileSchema>;
export type LibraryFileOutcome = { ok: true; materials: MaterialEntry[]; media: MediumEntry[] } | { ok: false; issues: LibraryEntryIssue[] };

function duplicateIds(list: ReadonlyArray<{ id: string }>, key: 'materials' | 'media', reservedIds: ReadonlySet<string>): LibraryEntryIssue[] {
  const seen = new Set<string>();
  const issues: LibraryEntryIssue[] = [];
  list.forEach(({ id }, i) => {
    if (reservedIds.has(id)) issues.push({ path: `${key}[${i}].id`, message: `id "${id}" is a built-in entry; choose another` });
    else if (seen.has(id)) issues.push({ path: `${key}[${i}].id`, message: `id "${id}" appears twice in this file` });
    seen.add(id);
  });
  return issues;
}

/** `builtInMaterialIds` / `builtInMediumIds`: ids a user entry may not take. */
export function parseLibraryFileText(text: string, builtInMaterialIds: ReadonlySet<string>, builtInMediumIds: ReadonlySet<string>): LibraryFileOutcome {
  if (text.length > MAX_LIBRARY_FILE_BYTES) {
    return { ok: false, issues: [{ path: '(file)', message: `the file is ${(text.length / 1e6).toFixed(1)} MB; a library file may be at most ${MAX_LIBRARY_FILE_BYTES / 1e6} MB` }] };
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    return { ok: false, issues: [{ path: '(file)', message: `not valid JSON (${(e as Error).message}); the file may be truncated` }] };
  }
  const parsed = libraryFileSchema.safeParse(data);
  if (!parsed.success) return { ok: false, issues: parsed.error.issues.map((i) => ({ path: issuePath(i.path, '(file)'), message: i.message })) };
  const { materials, media } = parsed.data;
  const issues = [...duplicateIds(materials, 'materials', builtInMaterialIds), ...duplicateIds(media, 'media', builtInMediumIds)];
  return issues.length ? { ok: false, issues } : { ok: true, materials, media };
}
