// Browser tests in real Chromium. Builds nothing: `npm test` builds first (or run `npx vite build`).
// Starts `vite preview` on 127.0.0.1 (own process group, killed at the end), opens Debian's
// Chromium through playwright-core, and runs every spec in test/e2e/specs/*.mjs. A spec exports
// `name` and `async run({ page, baseUrl, shot })`, and throws to fail. Page errors, console errors
// and HTTP responses >= 400 fail the spec they happen in. Screenshots go to test/e2e/out/.
// Without Chromium: a plain message and exit 0, or exit 1 when COOLSTAGE_REQUIRE_BROWSER=1.
//   COOLSTAGE_E2E_ONLY=<part of a spec name>   run only matching specs
//   COOLSTAGE_E2E_DIST=<dir>                   serve another build output directory
import { existsSync } from 'node:fs';
import { mkdir, readdir } from 'node:fs/promises';
import { join, dirname } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { CHROMIUM, openPreviewBrowser } from './lib/previewBrowser.mjs';

const HERE = dirname(fileURLToPath(import.meta.url));
const ROOT = join(HERE, '..', '..');
const OUT = join(HERE, 'out');
const SPEC_TIMEOUT_MS = 60_000;

if (!existsSync(CHROMIUM)) {
  const msg = `e2e: Chromium not found at ${CHROMIUM} (Debian: apt-get install chromium).`;
  if (process.env.COOLSTAGE_REQUIRE_BROWSER === '1') {
    console.error(`${msg} COOLSTAGE_REQUIRE_BROWSER=1, so this is a failure.`);
    process.exit(1);
  }
  console.log(`${msg} The browser tests were SKIPPED.`);
  process.exit(0);
}
const distDir = process.env.COOLSTAGE_E2E_DIST ?? join(ROOT, 'dist');
if (!existsSync(join(distDir, 'index.html'))) {
  console.error(`e2e: no build at ${distDir}; run \`npx vite build\` first (npm test does).`);
  process.exit(1);
}

function withTimeout(promise, ms, what) {
  let timer;
  return Promise.race([promise, new Promise((_, reject) => (timer = setTimeout(() => reject(new Error(`${what} took longer than ${ms} ms`)), ms)))]).finally(() => clearTimeout(timer));
}

const only = process.env.COOLSTAGE_E2E_ONLY;
const specFiles = (await readdir(join(HERE, 'specs'))).filter((f) => f.endsWith('.mjs')).sort();
const specs = [];
for (const f of specFiles) {
  const mod = await import(pathToFileURL(join(HERE, 'specs', f)).href);
  if (typeof mod.run !== 'function' || typeof mod.name !== 'string') throw new Error(`spec ${f} must export name and run`);
  if (!only || mod.name.includes(only)) specs.push({ file: f, name: mod.name, run: mod.run });
}

await mkdir(OUT, { recursive: true });
let passed = 0;
let failed = 0;
let browser;
try {
  browser = await openPreviewBrowser({ root: ROOT, distDir, port: process.env.COOLSTAGE_E2E_PORT ? Number(process.env.COOLSTAGE_E2E_PORT) : undefined });
  const { context, baseUrl } = browser;
  for (const spec of specs) {
    const page = await context.newPage();
    const problems = [];
    page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
    page.on('console', (m) => m.type() === 'error' && problems.push(`console error: ${m.text()}`));
    page.on('response', (r) => r.status() >= 400 && problems.push(`HTTP ${r.status()} for ${r.url()}`));
    const slug = spec.file.replace(/\.mjs$/, '');
    let shots = 0;
    const shot = async (label) => {
      const path = join(OUT, `${slug}-${String(++shots).padStart(2, '0')}-${label}.png`);
      await page.screenshot({ path, fullPage: true });
      return path;
    };
    const started = Date.now();
    try {
      await withTimeout(spec.run({ page, baseUrl, shot, context }), SPEC_TIMEOUT_MS, spec.name);
      if (problems.length) throw new Error(problems.join('\n'));
      passed++;
      console.log(`  ✔ ${spec.name} (${Date.now() - started} ms)`);
    } catch (e) {
      failed++;
      await shot('failure').catch(() => {});
      console.log(`  ✖ ${spec.name}\n    ${String(e?.stack ?? e).split('\n').join('\n    ')}`);
      if (problems.length && !String(e).includes(problems[0])) console.log(`    also: ${problems.join('\n    also: ')}`);
    } finally {
      await page.close().catch(() => {});
    }
  }
} catch (e) {
  failed++;
  console.log(`  ✖ harness: ${e?.stack ?? e}`);
} finally {
  await browser?.close();
}
console.log(`e2e: ${passed} passed, ${failed} failed`);
process.exit(failed === 0 && passed > 0 ? 0 : 1);
