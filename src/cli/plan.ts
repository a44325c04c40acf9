// `npm run plan -- <file.json> [--json] [--series]`: run a plan headless with the same engine
// the workbench uses. Prints a per-stage table, or the result as JSON for scripts and batch studies.
// Exit codes: 0 done, 1 bad file, 2 bad arguments, 3 a stage could not be computed.
import { readFileSync } from 'node:fs';
import { formatPlanIssues } from '@/schema/parsePlan';
import { planFileFromText } from '@/schema/planFileFromText';
import { runPlan } from '@/engine/plan/runPlan';
import { formatStageTable } from './formatStageTable';
import { resultForJson } from './resultForJson';

const USAGE = 'usage: npm run plan -- <plan.json> [--json] [--series]';

function main(argv: string[]): number {
  const flags = new Set(argv.filter((a) => a.startsWith('--')));
  const files = argv.filter((a) => !a.startsWith('--'));
  const unknown = [...flags].filter((f) => f !== '--json' && f !== '--series');
  if (files.length !== 1 || unknown.length > 0) {
    process.stderr.write(`${unknown.length ? `unknown option ${unknown.join(', ')}\n` : ''}${USAGE}\n`);
    return 2;
  }
  const file = files[0];
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    process.stderr.write(`${file}: cannot read the file (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})\n`);
    return 1;
  }
  const parsed = planFileFromText(text);
  if (!parsed.ok) {
    process.stderr.write(`${file}: not a valid plan\n${formatPlanIssues(parsed.issues).replace(/^/gm, '  ')}\n`);
    return 1;
  }
  const { main: mainPlan, variants } = parsed.document;
  const result = runPlan(mainPlan);
  const variantResults = variants.map((v) => ({ id: v.id, name: v.name, result: runPlan(v.plan) }));
  const series = flags.has('--series');
  if (flags.has('--json')) {
    const json = { ...resultForJson(result, series), ...(variants.length ? { variants: variantResults.map((v) => ({ id: v.id, name: v.name, result: resultForJson(v.result, series) })) } : {}) };
    process.stdout.write(`${JSON.stringify(json, null, 2)}\n`);
  } else {
    process.stdout.write(formatStageTable(result));
    for (const v of variantResults) process.stdout.write(`\nvariant "${v.name}"\n${formatStageTable(v.result)}`);
  }
  const failed = [result, ...variantResults.map((v) => v.result)].filter((r) => r.failure);
  for (const r of failed) process.stderr.write(`${r.planName}: stage ${r.failure!.index + 1} (${r.failure!.name}) could not be computed: ${r.failure!.message}\n`);
  return failed.length ? 3 : 0;
}

process.exitCode = main(process.argv.slice(2));
