// `npm run bench`: run every engine benchmark in test/bench/*.bench.ts in turn and print its figures.
// Benchmarks print; they never pass or fail on time.
import { readdirSync } from 'node:fs';
import { spawnSync } from 'node:child_process';

const only = process.argv[2];
const files = readdirSync('test/bench').filter((f) => f.endsWith('.bench.ts') && (!only || f.includes(only))).sort();
let failed = 0;
for (const f of files) {
  console.log(`\n### ${f}`);
  const r = spawnSync('npx', ['tsx', `test/bench/${f}`], { stdio: 'inherit' });
  if (r.status !== 0) failed++;
}
if (failed) {
  console.error(`${failed} benchmark(s) did not run to the end.`);
  process.exit(1);
}
