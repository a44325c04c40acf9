import { describe, expect, it } from 'vitest';
import { BUILT_IN_MATERIALS, BUILT_IN_MEDIA } from '@/library/builtInLibrary';
import { LIBRARY_FILE_FORMAT, LIBRARY_FILE_VERSION, parseLibraryFileText } from '@/library/parseLibraryFile';
import { plainCarbonSteel } from '@/library/materials/plainCarbonSteel';
import { stillOil } from '@/library/media/stillOil';

const materialIds = new Set(BUILT_IN_MATERIALS.map((m) => m.id));
const mediumIds = new Set(BUILT_IN_MEDIA.map((m) => m.id));
const userSteel = { ...plainCarbonSteel, id: 'shop-steel-a', name: 'Shop steel A', source: 'user data' };
const userOil = { ...stillOil, id: 'tank-2-oil', name: 'Tank 2 oil' };
const file = (body: object) => JSON.stringify({ format: LIBRARY_FILE_FORMAT, version: LIBRARY_FILE_VERSION, ...body });

describe('parseLibraryFileText', () => {
  it('reads user materials and media back unchanged', () => {
    const out = parseLibraryFileText(file({ materials: [userSteel], media: [userOil] }), materialIds, mediumIds);
    expect(out).toEqual({ ok: true, materials: [userSteel], media: [userOil] });
  });

  it('an empty library is allowed; lists default to empty', () => {
    expect(parseLibraryFileText(file({}), materialIds, mediumIds)).toEqual({ ok: true, materials: [], media: [] });
  });

  it('names the entry and field of a bad value', () => {
    const bad = { ...userSteel, conductivityWPerMK: [[20, -1], [100, 50]] };
    const out = parseLibraryFileText(file({ materials: [userSteel, bad] }), materialIds, mediumIds);
    expect(out.ok ? [] : out.issues).toEqual([{ path: 'materials[1].conductivityWPerMK[0][1]', message: 'conductivity (W/m K) must be greater than zero' }]);
  });

  it('refuses ids that shadow built-ins or repeat inside the file', () => {
    const out = parseLibraryFileText(file({ materials: [userSteel, userSteel], media: [{ ...userOil, id: stillOil.id }] }), materialIds, mediumIds);
    expect(out.ok ? [] : out.issues).toEqual([
      { path: 'materials[1].id', message: 'id "shop-steel-a" appears twice in this file' },
      { path: 'media[0].id', message: 'id "still-oil" is a built-in entry; choose another' },
    ]);
  });

  it('refuses a wrong format, broken JSON and an oversized file with a sentence', () => {
    const wrong = parseLibraryFileText(JSON.stringify({ format: 'something-else', version: 1 }), materialIds, mediumIds);
    expect(wrong.ok ? [] : wrong.issues).toEqual([{ path: 'format', message: `format must be "${LIBRARY_FILE_FORMAT}"` }]);
    const broken = parseLibraryFileText(file({}).slice(0, 20), materialIds, mediumIds);
    expect(broken.ok ? '' : broken.issues[0].message).toMatch(/^not valid JSON/);
    const huge = parseLibraryFileText(' '.repeat(1_000_001), materialIds, mediumIds);
    expect(huge.ok ? '' : huge.issues[0].message).toMatch(/may be at most 1 MB/);
  });
});
