// The one door for plan files and links: JSON text (or a parsed value) in, a PlanDocument in
// kelvin or field-by-field issues out. Older versions are migrated first (planFileMigrations),
// the envelope is checked by planFileSchema, and every plan body goes through parsePlan, the
// single-plan door, so a plan is validated by the same rules wherever it comes from.
import { MAX_PLAN_BYTES, parsePlan, pathText, type PlanIssue } from './parsePlan';
import { PLAN_FORMAT, PLAN_VERSION } from './planSchema';
import { PLAN_FILE_VERSION, planFileSchema } from './planFileSchema';
import { migratePlanFile, type RawObject } from './planFileMigrations';
import type { PlanDocument, PlanVariant } from './planDocument';

export type PlanFileOutcome =
  | { ok: true; document: PlanDocument; migratedFrom: number | null }
  | { ok: false; issues: PlanIssue[] };

const fail = (path: string, message: string): PlanFileOutcome => ({ ok: false, issues: [{ path, message }] });

const isObject = (x: unknown): x is RawObject => typeof x === 'object' && x !== null && !Array.isArray(x);

export function planFileFromValue(data: unknown): PlanFileOutcome {
  if (!isObject(data)) return fail('(file)', 'a plan file must hold one JSON object');
  if (data.format !== PLAN_FORMAT) return fail('format', `format must be "${PLAN_FORMAT}" (got ${JSON.stringify(data.format) ?? 'nothing'}); this is not a Coolstage plan file`);
  const version = data.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return fail('version', `version must be a whole number from 1 to ${PLAN_FILE_VERSION} (got ${JSON.stringify(version) ?? 'nothing'})`);
  }
  if (version > PLAN_FILE_VERSION) {
    return fail('version', `this file is version ${version}, written by a newer Coolstage; this one reads versions 1 to ${PLAN_FILE_VERSION}`);
  }
  const migrated = migratePlanFile(data, version);
  if (!migrated.ok) return fail('version', migrated.message);
  const toSource = (path: string) => migrated.applied.reduceRight((p, m) => m.pathInSource(p), path);

  const envelope = planFileSchema.safeParse(migrated.raw);
  if (!envelope.success) {
    return { ok: false, issues: envelope.error.issues.map((i) => ({ path: i.path.length === 0 ? '(file)' : toSource(pathText(i.path)), message: i.message })) };
  }
  const { temperatureUnit, main, variants, sheet } = envelope.data;
  const issues: PlanIssue[] = [];
  /** A body is checked as a one-plan file of the same unit; its issue paths are put under `prefix`. */
  const body = (raw: RawObject, prefix: string) => {
    const outcome = parsePlan({ format: PLAN_FORMAT, version: PLAN_VERSION, temperatureUnit, ...raw });
    if (outcome.ok) return outcome.plan;
    for (const i of outcome.issues) issues.push({ path: toSource(i.path === '(plan)' ? prefix : `${prefix}.${i.path}`), message: i.message });
    return null;
  };
  const mainPlan = body(main, 'main');
  const variantPlans: PlanVariant[] = [];
  variants.forEach((v, i) => {
    const plan = body(v.plan, `variants[${i}].plan`);
    if (plan) variantPlans.push({ id: v.id, name: v.name, plan });
  });
  if (issues.length || !mainPlan) return { ok: false, issues };
  return { ok: true, document: { main: mainPlan, variants: variantPlans, sheet }, migratedFrom: version === PLAN_FILE_VERSION ? null : version };
}

export function planFileFromText(text: string): PlanFileOutcome {
  if (text.length > MAX_PLAN_BYTES) {
    return fail('(file)', `the file is ${(text.length / 1e6).toFixed(1)} MB; a plan file may be at most ${MAX_PLAN_BYTES / 1e6} MB`);
  }
  if (text.trim() === '') return fail('(file)', 'the file is empty');
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    return fail('(file)', `not valid JSON (${(e as Error).message}); the file may be truncated or not a plan file`);
  }
  return planFileFromValue(data);
}
