// The plan file door: round trips, the v1 -> v2 migration, and every bad-file case.
import { describe, expect, it } from 'vitest';
import { planFileFromText, planFileFromValue } from '@/schema/planFileFromText';
import { planFileToText } from '@/schema/planFileToText';
import { planFileMigrations, migratePlanFile } from '@/schema/planFileMigrations';
import { MAX_PLAN_BYTES } from '@/schema/parsePlan';
import { PLAN_FILE_VERSION } from '@/schema/planFileSchema';
import { demoDocument, demoPlanCelsius, demoPlanK } from './demoDocument';

const issuesOf = (text: string) => {
  const out = planFileFromText(text);
  if (out.ok) throw new Error(`expected issues for input ${text.slice(0, 200)}, got a document`);
  return out.issues;
};
const v2 = () => JSON.parse(planFileToText(demoDocument)) as Record<string, any>;

describe('plan file round trip', () => {
  it.each(['degC', 'K'] as const)('document -> file (%s) -> document is unchanged', (unit) => {
    const text = planFileToText(demoDocument, unit);
    const back = planFileFromText(text);
    expect(back.ok, JSON.stringify(!back.ok && back.issues)).toBe(true);
    if (back.ok) {
      expect(back.document).toEqual(demoDocument);
      expect(back.migratedFrom).toBeNull();
    }
  });

  it('writes the version, the unit and the temperatures in that unit', () => {
    const file = v2();
    expect(file.format).toBe('coolstage-plan');
    expect(file.version).toBe(PLAN_FILE_VERSION);
    expect(file.temperatureUnit).toBe('degC');
    expect(file.main.initialTemperature).toBe(850);
    expect(file.variants[0].plan.stages[1].medium.heatTransfer.rows[0]).toEqual([60, 400]);
    expect(file.sheet.revision).toBe('B');
  });
});

describe('migrations', () => {
  it('are an unbroken chain from version 1 to the current version', () => {
    expect(planFileMigrations.map((m) => [m.from, m.to])).toEqual([[1, 2]]);
    expect(planFileMigrations.at(-1)?.to).toBe(PLAN_FILE_VERSION);
  });

  it('v1-single-plan-to-v2-document moves the body under main and adds no variants', () => {
    const out = migratePlanFile(demoPlanCelsius as unknown as Record<string, unknown>, 1);
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.applied.map((m) => m.name)).toEqual(['v1-single-plan-to-v2-document']);
    expect(out.raw).toEqual({
      format: 'coolstage-plan',
      version: 2,
      temperatureUnit: 'degC',
      main: { name: demoPlanCelsius.name, part: demoPlanCelsius.part, initialTemperature: 850, stages: demoPlanCelsius.stages },
      variants: [],
    });
  });

  it('a version-1 file opens as a document with the same plan and empty sheet fields', () => {
    const out = planFileFromText(JSON.stringify(demoPlanCelsius));
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.migratedFrom).toBe(1);
    expect(out.document.main).toEqual(demoPlanK);
    expect(out.document.variants).toEqual([]);
    expect(out.document.sheet).toEqual({ revision: '', preparedBy: '', checkedBy: '', date: '' });
  });

  it('issues in a version-1 file name the field of that file, not of the migrated one', () => {
    const bad = structuredClone(demoPlanCelsius) as any;
    bad.part.shape.radiusM = -1;
    bad.stages[1].end.temperature = -300;
    const issues = issuesOf(JSON.stringify(bad));
    expect(issues.map((i) => i.path).sort()).toEqual(['part.shape.radiusM']);
    bad.part.shape.radiusM = 0.02;
    expect(issuesOf(JSON.stringify(bad))).toEqual([{ path: 'stages[1].end.temperature', message: expect.stringContaining('absolute zero') }]);
  });
});

describe('bad files change nothing and say what is wrong', () => {
  it('malformed JSON', () => {
    const [i] = issuesOf('{"format": "coolstage-plan", version: 2}');
    expect(i.path).toBe('(file)');
    expect(i.message).toMatch(/not valid JSON/);
  });

  it('truncated file', () => {
    const text = planFileToText(demoDocument);
    const [i] = issuesOf(text.slice(0, Math.floor(text.length / 2)));
    expect(i.message).toMatch(/truncated/);
  });

  it('empty file', () => {
    expect(issuesOf('  \n')[0].message).toMatch(/empty/);
  });

  it('oversized file is refused before parsing', () => {
    const big = `{"format":"coolstage-plan","pad":"${'x'.repeat(MAX_PLAN_BYTES)}"}`;
    const [i] = issuesOf(big);
    expect(i.path).toBe('(file)');
    expect(i.message).toMatch(/at most 2 MB/);
  });

  it('not an object, wrong format', () => {
    expect(issuesOf('[1,2]')[0].message).toMatch(/one JSON object/);
    expect(issuesOf('{"format":"something-else","version":2}')[0]).toMatchObject({ path: 'format' });
  });

  it.each([
    [3, /newer Coolstage/],
    [0, /whole number from 1 to 2/],
    ['2', /whole number/],
    [1.5, /whole number/],
  ])('wrong version %j', (version, message) => {
    const file = v2();
    file.version = version;
    const [i] = issuesOf(JSON.stringify(file));
    expect(i.path).toBe('version');
    expect(i.message).toMatch(message);
  });

  it('names every bad field, in the main plan and in variants', () => {
    const file = v2();
    file.main.stages[0].medium.heatTransfer.hWPerM2K = 0;
    file.variants[0].plan.part.material.densityKgPerM3 = 'heavy';
    file.variants.push({ ...file.variants[0], name: '' });
    file.sheet.revision = 'R'.repeat(41);
    const paths = issuesOf(JSON.stringify(file)).map((i) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['variants[1].name', 'variants[1].id', 'sheet.revision']));
    // Envelope issues are reported first; fix them and the plan bodies are checked.
    file.variants.pop();
    file.sheet.revision = 'C';
    expect(issuesOf(JSON.stringify(file)).map((i) => i.path).sort()).toEqual(['main.stages[0].medium.heatTransfer.hWPerM2K', 'variants[0].plan.part.material.densityKgPerM3']);
  });

  it('unknown keys are refused (strict)', () => {
    const file = v2();
    file.main.stages[0].colour = 'red';
    file.extra = true;
    expect(issuesOf(JSON.stringify(file)).map((i) => i.path)).toEqual(['(file)']);
    delete file.extra;
    expect(issuesOf(JSON.stringify(file)).map((i) => i.path)).toEqual(['main.stages[0]']);
  });

  it('a value that is not text never reaches the parser', () => {
    expect(planFileFromValue(null).ok).toBe(false);
    expect(planFileFromValue('coolstage-plan').ok).toBe(false);
  });
});

describe('variant ids', () => {
  it('"main" is kept for the main plan', () => {
    const file = v2();
    file.variants[0].id = 'main';
    expect(issuesOf(JSON.stringify(file))).toEqual([{ path: 'variants[0].id', message: 'id "main" is kept for the main plan' }]);
  });
});
