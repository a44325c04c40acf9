// The one door into the app for a plan: JSON text or a parsed value in, a kelvin plan or
// field-by-field issues out. Nothing else in the app validates a plan again.
import { planSchema, type PlanK } from './planSchema';
import { toKelvinPlan } from './planTemperatures';

/** Plans are small (a few kB); anything far larger is a wrong file or an attack. */
export const MAX_PLAN_BYTES = 2_000_000;

export type PlanIssue = { path: string; message: string };
export type PlanParseOutcome = { ok: true; plan: PlanK } | { ok: false; issues: PlanIssue[] };

export function pathText(path: readonly PropertyKey[]): string {
  return path.length === 0 ? '(plan)' : path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '');
}

/** Temperatures below absolute zero are caught after the unit is known. */
function belowAbsoluteZero(plan: PlanK): PlanIssue[] {
  const issues: PlanIssue[] = [];
  const check = (path: string, k: number) => {
    if (!(k > 0)) issues.push({ path, message: `temperature ${k.toFixed(2)} K is at or below absolute zero` });
  };
  check('initialTemperature', plan.initialTemperature);
  const m = plan.part.material;
  for (const key of ['conductivityWPerMK', 'densityKgPerM3', 'specificHeatJPerKgK'] as const) {
    const p = m[key];
    if (typeof p !== 'number') p.table.forEach(([t], i) => check(`part.material.${key}.table[${i}][0]`, t));
  }
  plan.stages.forEach((s, i) => {
    check(`stages[${i}].medium.temperature`, s.medium.temperature);
    if (s.medium.heatTransfer.kind === 'surface-table') s.medium.heatTransfer.rows.forEach(([t], j) => check(`stages[${i}].medium.heatTransfer.rows[${j}][0]`, t));
    const sur = s.medium.radiation?.surroundingsTemperature;
    if (sur !== undefined) check(`stages[${i}].medium.radiation.surroundingsTemperature`, sur);
    if (s.end.kind === 'point-temperature') check(`stages[${i}].end.temperature`, s.end.temperature);
  });
  return issues;
}

export function parsePlan(data: unknown): PlanParseOutcome {
  const parsed = planSchema.safeParse(data);
  if (!parsed.success) {
    return { ok: false, issues: parsed.error.issues.map((i) => ({ path: pathText(i.path), message: i.message })) };
  }
  const plan = toKelvinPlan(parsed.data);
  const issues = belowAbsoluteZero(plan);
  return issues.length ? { ok: false, issues } : { ok: true, plan };
}

export function parsePlanText(text: string): PlanParseOutcome {
  if (text.length > MAX_PLAN_BYTES) {
    return { ok: false, issues: [{ path: '(file)', message: `the file is ${(text.length / 1e6).toFixed(1)} MB; a plan file may be at most ${MAX_PLAN_BYTES / 1e6} MB` }] };
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    return { ok: false, issues: [{ path: '(file)', message: `not valid JSON (${(e as Error).message}); the file may be truncated` }] };
  }
  return parsePlan(data);
}

export function formatPlanIssues(issues: PlanIssue[]): string {
  return issues.map((i) => `${i.path}: ${i.message}`).join('\n');
}

