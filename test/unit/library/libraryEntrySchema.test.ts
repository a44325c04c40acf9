import { describe, expect, it } from 'vitest';
import { materialEntrySchema, mediumEntrySchema } from '@/library/libraryEntrySchema';
import { BUILT_IN_MATERIALS, BUILT_IN_MEDIA } from '@/library/builtInLibrary';
import { parseMaterialEntry, parseMediumEntry } from '@/library/parseLibraryEntry';
import { plainCarbonSteel } from '@/library/materials/plainCarbonSteel';
import { stillWater } from '@/library/media/stillWater';

const issuesOf = (out: { ok: true } | { ok: false; issues: { path: string; message: string }[] }) => (out.ok ? [] : out.issues);

describe('built-in entries against the entry schema', () => {
  it.each(BUILT_IN_MATERIALS.map((m) => [m.id, m] as const))('material %s passes and names a source', (_id, entry) => {
    const parsed = materialEntrySchema.safeParse(entry);
    expect(parsed.success, `${entry.id}: ${parsed.error?.message}`).toBe(true);
    expect(entry.source.trim().length).toBeGreaterThan(20);
    expect(entry.emissivity.source.trim().length).toBeGreaterThan(10);
  });

  it.each(BUILT_IN_MEDIA.map((m) => [m.id, m] as const))('medium %s passes and names a source for its h range', (_id, entry) => {
    const parsed = mediumEntrySchema.safeParse(entry);
    expect(parsed.success, `${entry.id}: ${parsed.error?.message}`).toBe(true);
    expect(entry.hWPerM2K.source.trim().length).toBeGreaterThan(10);
  });

  it('ids are unique across materials and across media', () => {
    const materialIds = BUILT_IN_MATERIALS.map((m) => m.id);
    const mediumIds = BUILT_IN_MEDIA.map((m) => m.id);
    expect(new Set(materialIds).size).toBe(materialIds.length);
    expect(new Set(mediumIds).size).toBe(mediumIds.length);
  });

  it('every value that is recalled rather than looked up says so', () => {
    for (const m of BUILT_IN_MATERIALS) expect(m.source, m.id).toMatch(/from memory|common practice/);
    for (const m of BUILT_IN_MEDIA) expect(m.hWPerM2K.source, m.id).toMatch(/from memory|common practice/);
  });
});

describe('user entries through parseMaterialEntry / parseMediumEntry', () => {
  const userSteel = { ...plainCarbonSteel, id: 'my-tool-steel', name: 'My tool steel', source: 'user data' };

  it('accepts a well-formed user material and fills empty notes and cautions', () => {
    const { notes: _n, cautions: _c, ...bare } = userSteel;
    const out = parseMaterialEntry(bare);
    expect(issuesOf(out)).toEqual([]);
    expect(out.ok && out.entry.notes).toEqual([]);
  });

  it('names the field when table temperatures fall', () => {
    const bad = { ...userSteel, conductivityWPerMK: [[100, 50], [20, 52]] };
    expect(issuesOf(parseMaterialEntry(bad))).toEqual([{ path: 'conductivityWPerMK', message: 'conductivity temperatures must rise strictly from row to row' }]);
  });

  it('names the field and unit when a value is not positive', () => {
    const bad = { ...userSteel, specificHeatJPerKgK: [[20, 450], [100, 0]] };
    expect(issuesOf(parseMaterialEntry(bad))).toEqual([{ path: 'specificHeatJPerKgK[1][1]', message: 'specific heat (J/kg K) must be greater than zero' }]);
  });

  it('refuses a table temperature below absolute zero', () => {
    const bad = { ...userSteel, densityKgPerM3: [[-300, 7860], [20, 7860]] };
    expect(issuesOf(parseMaterialEntry(bad))[0]).toEqual({ path: 'densityKgPerM3[0][0]', message: 'density temperature must be above -273.15 degC' });
  });

  it('refuses a suggested emissivity outside its own range', () => {
    const bad = { ...userSteel, emissivity: { min: 0.6, max: 0.9, suggested: 0.95, source: 'user data' } };
    expect(issuesOf(parseMaterialEntry(bad))).toEqual([{ path: 'emissivity.suggested', message: 'emissivity suggested value must lie inside [min, max]' }]);
  });

  it('refuses an empty source and an id taken by a built-in entry', () => {
    expect(issuesOf(parseMaterialEntry({ ...userSteel, source: '  ' }))).toEqual([{ path: 'source', message: 'source is empty' }]);
    const taken = new Set(BUILT_IN_MATERIALS.map((m) => m.id));
    expect(issuesOf(parseMaterialEntry({ ...userSteel, id: plainCarbonSteel.id }, taken))).toEqual([{ path: 'id', message: 'id "plain-carbon-steel" is already taken; choose another' }]);
  });

  it('refuses unknown fields, so typos do not pass silently', () => {
    const issues = issuesOf(parseMaterialEntry({ ...userSteel, conductivity: 50 }));
    expect(issues.length).toBe(1);
    expect(issues[0].path).toBe('(entry)');
  });

  it('refuses a medium whose default h lies outside its range and one without cautions', () => {
    const badH = { ...stillWater, id: 'my-tank', hWPerM2K: { min: 1000, max: 3000, suggested: 5000, source: 'user data' } };
    expect(issuesOf(parseMediumEntry(badH))).toEqual([{ path: 'hWPerM2K.suggested', message: 'h (W/m2 K) suggested value must lie inside [min, max]' }]);
    const noCautions = { ...stillWater, id: 'my-tank', cautions: [] };
    expect(issuesOf(parseMediumEntry(noCautions))).toEqual([{ path: 'cautions', message: 'a medium needs at least one caution' }]);
  });

  it('refuses a boiling curve whose film limit lies below its convection limit', () => {
    const curve = { ...stillWater.boilingCurve!, convectionBelowC: 700, filmAboveC: 600 };
    expect(issuesOf(parseMediumEntry({ ...stillWater, id: 'my-tank', boilingCurve: curve }))).toEqual([
      { path: 'boilingCurve.filmAboveC', message: 'boiling curve convection limit must lie below its film limit' },
    ]);
  });
});
