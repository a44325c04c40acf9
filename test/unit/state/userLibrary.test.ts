// The user's library: entries built from plan data pass the library door with temperatures in degC,
// are kept over a save and read back, and damaged or id-clashing entries are left out with a notice.
import { describe, expect, it } from 'vitest';
import demoPlan from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import { parseMaterialEntry, parseMediumEntry } from '@/library/parseLibraryEntry';
import { materialEntryFromPlan, materialWordsOf } from '@/features/library-editor/materialEntryFromPlan';
import { mediumEntryFromPlan, mediumWordsOf } from '@/features/library-editor/mediumEntryFromPlan';
import { idFromName } from '@/features/library-editor/idFromName';
import { SAVED_USER_LIBRARY_KEY, readUserLibrary, writeUserLibrary } from '@/state/savedUserLibrary';
import { MemoryStorage } from './memoryStorage';

const parsed = parsePlan(demoPlan);
if (!parsed.ok) throw new Error('demo plan invalid');
const plan = parsed.plan;

function savedMaterial() {
  const words = { ...materialWordsOf(plan.part.material), id: 'shop-bar', description: 'our bar stock' };
  const outcome = parseMaterialEntry(materialEntryFromPlan(plan.part.material, words, { lowK: 293.15, highK: 1143.15 }));
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.issues));
  return outcome.entry;
}

describe('library entries from the plan', () => {
  it('a material keeps the demo tables, back in degC exactly as the demo file has them', () => {
    const entry = savedMaterial();
    const table = demoPlan.part.material.conductivityWPerMK.table;
    expect(entry.conductivityWPerMK).toEqual(table);
    expect(entry.emissivity.suggested).toBe(0.8);
  });

  it('a constant property becomes a flat two-row table over the plan span', () => {
    const material = { ...plan.part.material, densityKgPerM3: 7800 };
    const entry = materialEntryFromPlan(material, { ...materialWordsOf(material), id: 'x-bar', description: 'd' }, { lowK: 298.15, highK: 1143.15 }) as { densityKgPerM3: unknown };
    expect(entry.densityKgPerM3).toEqual([
      [25, 7800],
      [870, 7800],
    ]);
  });

  it('an empty description is refused by the door, naming the field', () => {
    const outcome = parseMaterialEntry(materialEntryFromPlan(plan.part.material, materialWordsOf(plan.part.material), { lowK: 293.15, highK: 1143.15 }));
    expect(outcome.ok).toBe(false);
    if (!outcome.ok) expect(outcome.issues.map((i) => i.path)).toContain('description');
  });

  it('a boiling-curve medium carries its h table as the curve, surface temperatures in degC', () => {
    const medium = plan.stages[1].medium;
    if (medium.heatTransfer.kind !== 'surface-table') throw new Error('the demo quench is expected to use a boiling curve');
    const words = { ...mediumWordsOf(medium), id: 'tank-2', description: 'our tank' };
    const outcome = parseMediumEntry(mediumEntryFromPlan(medium, words));
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.issues));
    const rowsC = medium.heatTransfer.rows.map(([k, h]) => [Number((k - 273.15).toPrecision(12)), h]);
    expect(outcome.entry.boilingCurve?.hWPerM2KBySurfaceC).toEqual(rowsC);
    expect(outcome.entry.phase).toBe('liquid');
    expect(outcome.entry.temperatureC.suggested).toBeCloseTo(medium.temperature - 273.15, 9);
  });

  it('ids are lower-case words joined by hyphens', () => {
    expect(idFromName('  My Tool-Steel (H13), 2nd batch ')).toBe('my-tool-steel-h13-2nd-batch');
  });
});

describe('saved user library', () => {
  it('round-trips through storage', () => {
    const storage = new MemoryStorage();
    const entry = savedMaterial();
    writeUserLibrary(storage, { materials: [entry], media: [] });
    expect(readUserLibrary(storage)).toEqual({ library: { materials: [entry], media: [] }, notice: null });
  });

  it('leaves out a damaged entry and one that takes a built-in id, and says how many', () => {
    const storage = new MemoryStorage();
    const good = savedMaterial();
    storage.setItem(SAVED_USER_LIBRARY_KEY, JSON.stringify({ materials: [good, { ...good, id: 'plain-carbon-steel' }, { id: 'broken' }], media: [] }));
    const read = readUserLibrary(storage);
    expect(read.library.materials.map((m) => m.id)).toEqual(['shop-bar']);
    expect(read.notice).toBe('2 saved library entries were damaged and left out.');
  });

  it('not JSON: nothing kept, a notice', () => {
    const storage = new MemoryStorage();
    storage.setItem(SAVED_USER_LIBRARY_KEY, '{oops');
    expect(readUserLibrary(storage).library).toEqual({ materials: [], media: [] });
    expect(readUserLibrary(storage).notice).toMatch(/not valid JSON/);
  });
});
