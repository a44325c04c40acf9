// The user's own library entries in localStorage. Reading back is an edge: every entry passes the
// library door (parseMaterialEntry / parseMediumEntry); a damaged entry is left out with a notice.
import { BUILT_IN_MATERIALS, BUILT_IN_MEDIA } from '@/library/builtInLibrary';
import { parseMaterialEntry, parseMediumEntry } from '@/library/parseLibraryEntry';
import type { MaterialEntry, MediumEntry } from '@/library/libraryEntrySchema';
import type { UserLibrary } from './userLibrarySlice';

export const SAVED_USER_LIBRARY_KEY = 'coolstage.workbench.userLibrary';
/** A user library larger than this is not kept (plans are the thing to save; the library is small). */
export const MAX_USER_ENTRIES = 100;

export function writeUserLibrary(storage: Pick<Storage, 'setItem'>, library: UserLibrary): void {
  storage.setItem(SAVED_USER_LIBRARY_KEY, JSON.stringify(library));
}

export function readUserLibrary(storage: Pick<Storage, 'getItem'>): { library: UserLibrary; notice: string | null } {
  const empty = { materials: [], media: [] };
  let text: string | null;
  try {
    text = storage.getItem(SAVED_USER_LIBRARY_KEY);
  } catch {
    return { library: empty, notice: null };
  }
  if (text === null) return { library: empty, notice: null };
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    return { library: empty, notice: 'Your saved library entries could not be read (not valid JSON) and were left out.' };
  }
  const list = (key: 'materials' | 'media'): unknown[] => {
    const v = typeof data === 'object' && data !== null ? (data as Record<string, unknown>)[key] : undefined;
    return Array.isArray(v) ? v.slice(0, MAX_USER_ENTRIES) : [];
  };
  const taken = new Set<string>([...BUILT_IN_MATERIALS, ...BUILT_IN_MEDIA].map((e) => e.id));
  let dropped = 0;
  const materials: MaterialEntry[] = [];
  for (const raw of list('materials')) {
    const parsed = parseMaterialEntry(raw, taken);
    if (parsed.ok) {
      materials.push(parsed.entry);
      taken.add(parsed.entry.id);
    } else dropped++;
  }
  const media: MediumEntry[] = [];
  for (const raw of list('media')) {
    const parsed = parseMediumEntry(raw, taken);
    if (parsed.ok) {
      media.push(parsed.entry);
      taken.add(parsed.entry.id);
    } else dropped++;
  }
  return { library: { materials, media }, notice: dropped ? `${dropped} saved library entr${dropped === 1 ? 'y was' : 'ies were'} damaged and left out.` : null };
}
