// The ordered list of migrations that bring an older plan file up to PLAN_FILE_VERSION.
// Each migration takes the raw JSON object of version `from` and returns the raw object of
// version `to`; nothing is validated here (the file door validates the result once).
// `pathInSource` maps an issue path of the newer layout back to the field of the file the
// user actually opened, so that errors point at their own file.
import { PLAN_FILE_VERSION } from './planFileSchema';

export type RawObject = Record<string, unknown>;

export interface PlanFileMigration {
  name: string;
  from: number;
  to: number;
  migrate: (raw: RawObject) => RawObject;
  pathInSource: (path: string) => string;
}

const BODY_KEYS = ['name', 'part', 'initialTemperature', 'stages'] as const;

/** Version 1 held one plan at the top level; version 2 puts it under `main`, beside variants and the sheet block. */
const singlePlanToDocument: PlanFileMigration = {
  name: 'v1-single-plan-to-v2-document',
  from: 1,
  to: 2,
  migrate: (raw) => {
    const main: RawObject = {};
    const rest: RawObject = {};
    for (const [key, value] of Object.entries(raw)) {
      if ((BODY_KEYS as readonly string[]).includes(key)) main[key] = value;
      else if (key !== 'version') rest[key] = value;
    }
    return { ...rest, version: 2, main, variants: [] };
  },
  pathInSource: (path) => (path === 'main' ? '(plan)' : path.replace(/^main\./, '')),
};

export const planFileMigrations: readonly PlanFileMigration[] = [singlePlanToDocument];

export type MigrationOutcome =
  | { ok: true; raw: RawObject; applied: PlanFileMigration[] }
  | { ok: false; message: string };

/** Run every migration from `version` up to the current one, in order. */
export function migratePlanFile(raw: RawObject, version: number): MigrationOutcome {
  const applied: PlanFileMigration[] = [];
  let current = raw;
  let at = version;
  while (at < PLAN_FILE_VERSION) {
    const step = planFileMigrations.find((m) => m.from === at);
    if (!step) return { ok: false, message: `version ${version} files cannot be read: there is no migration from version ${at}` };
    current = step.migrate(current);
    applied.push(step);
    at = step.to;
  }
  return { ok: true, raw: current, applied };
}
