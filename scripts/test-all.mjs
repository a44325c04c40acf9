// `npm test`: every test the project has. Type checks, unit and component tests (vitest),
// then a production build and the browser tests in Debian's Chromium.
// Without /usr/bin/chromium the browser tests are skipped with a plain message, unless
// COOLSTAGE_REQUIRE_BROWSER=1 (set by .ci/run), which makes a missing browser a failure.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const CHROMIUM = process.env.COOLSTAGE_CHROMIUM ?? '/usr/bin/chromium';
const requireBrowser = process.env.COOLSTAGE_REQUIRE_BROWSER === '1';

function step(title, cmd, args) {
  console.log(`\n=== ${title}: ${cmd} ${args.join(' ')}`);
  const r = spawnSync(cmd, args, { stdio: 'inherit' });
  if (r.status !== 0) {
    console.error(`\n${title} failed (exit ${r.status ?? r.signal}).`);
    process.exit(r.status || 1);
  }
}

step('type check (app)', 'npx', ['tsc', '--noEmit', '-p', 'tsconfig.json']);
step('type check (engine, no DOM)', 'npx', ['tsc', '--noEmit', '-p', 'tsconfig.engine.json']);
step('unit and component tests', 'npx', ['vitest', 'run']);

if (!existsSync(CHROMIUM)) {
  const msg = `Browser tests need Chromium at ${CHROMIUM} (Debian: apt-get install chromium).`;
  if (requireBrowser) {
    console.error(`\n${msg} COOLSTAGE_REQUIRE_BROWSER=1, so this is a failure.`);
    process.exit(1);
  }
  console.log(`\n${msg} It is not installed: the browser tests were SKIPPED.`);
  process.exit(0);
}
step('production build', 'npx', ['vite', 'build', '--logLevel', 'warn']);
step('browser tests (Chromium)', 'node', ['test/e2e/run.mjs']);
