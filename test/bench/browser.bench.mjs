// Browser benchmark (prints figures; not a test). Run after a build: `npx vite build && node test/bench/browser.bench.mjs`.
//   - edit -> chart updated: median and p95 over EDIT_COUNT edits of h, for the demo plan (1-D) and the
//     same plan as a short cylinder (2-D); measured in the page from the input event to the frame after
//     the temperature chart's path changed.
//   - load -> first chart on localhost: median of LOAD_COUNT cold loads (nothing saved).
//   - JavaScript shipped, raw and gzip: what the first screen loads (entry, its static imports, the
//     engine worker) before plotly, and everything.
// Budgets from the workbench issue: p95 < 100 ms (1-D), < 300 ms (2-D); first chart < 1.5 s;
// < 150 KB gzip before plotly, < 600 KB gzip in all.
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { CHROMIUM, openPreviewBrowser } from '../e2e/lib/previewBrowser.mjs';

const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const DIST = process.env.COOLSTAGE_BENCH_DIST ?? join(ROOT, 'dist');
const EDIT_COUNT = 50;
const LOAD_COUNT = 5;
const EDIT_TIMEOUT_MS = 10_000;
const KB = 1024;
const BUDGET = { edit1DP95Ms: 100, edit2DP95Ms: 300, firstChartMs: 1500, beforePlotlyGzipKB: 150, allGzipKB: 600 };

if (!existsSync(join(DIST, 'index.html'))) {
  console.error(`bench: no build at ${DIST}; run \`npx vite build\` first.`);
  process.exit(1);
}
if (!existsSync(CHROMIUM)) {
  console.error(`bench: Chromium not found at ${CHROMIUM}.`);
  process.exit(1);
}

// ---- JavaScript shipped: sizes from the build output; which files a cold load fetches is recorded in the browser.
const assets = readdirSync(join(DIST, 'assets')).filter((f) => f.endsWith('.js'));
const size = (f) => {
  const bytes = readFileSync(join(DIST, 'assets', f));
  return { raw: bytes.length, gzip: gzipSync(bytes, { level: 9 }).length };
};
const isPlotly = (f) => /plotly-basic|plotly\.min|plotly-impl/i.test(f);
const sum = (files) => files.reduce((s, f) => ({ raw: s.raw + size(f).raw, gzip: s.gzip + size(f).gzip }), { raw: 0, gzip: 0 });
const all = sum(assets);

// ---- Browser figures
let browser;
let BASE_URL;

const quantile = (xs, q) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil(q * s.length) - 1)];
};

/** In the page: time from setting a field to the frame after the temperature chart changed. */
const MEASURE_EDIT = `window.__coolstageMeasureEdit = (labelStart, value, timeoutMs) => new Promise((resolve) => {
  const input = [...document.querySelectorAll('input')].find((i) => i.labels && i.labels[0] && i.labels[0].textContent.startsWith(labelStart));
  const figure = document.querySelector('figure[aria-label^="Temperature against time"]');
  if (!input || !figure) return resolve({ error: 'field or chart not found' });
  const paths = () => [...figure.querySelectorAll('.scatterlayer .trace path.js-line')].map((p) => p.getAttribute('d')).join('|');
  const before = paths();
  let done = false;
  const finish = (r) => { if (!done) { done = true; observer.disconnect(); resolve(r); } };
  const observer = new MutationObserver(() => { if (paths() !== before) requestAnimationFrame(() => finish({ ms: performance.now() - t0 })); });
  observer.observe(figure, { subtree: true, childList: true, attributes: true });
  setTimeout(() => finish({ error: 'chart did not change within ' + timeoutMs + ' ms' }), timeoutMs);
  const setValue = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value').set;
  input.focus();
  const t0 = performance.now();
  setValue.call(input, String(value));
  input.dispatchEvent(new Event('input', { bubbles: true }));
});`;

const FIRST_CHART_TIMEOUT_MS = 20_000;
const FIRST_CHART = `new Promise((resolve) => {
  setTimeout(() => resolve(NaN), ${FIRST_CHART_TIMEOUT_MS});
  const seen = () => document.querySelector('figure[aria-label^="Temperature against time"] .scatterlayer .trace path.js-line');
  const check = () => (seen() ? requestAnimationFrame(() => resolve(performance.now())) : setTimeout(check, 5));
  check();
})`;

async function openFresh(page) {
  await page.goto(BASE_URL);
  await page.evaluate(() => localStorage.clear());
}

async function measureEdits(page, label) {
  const times = [];
  const errors = [];
  for (let i = 0; i < EDIT_COUNT; i++) {
    const r = await page.evaluate(([l, v, t]) => window.__coolstageMeasureEdit(l, v, t), [label, 12 + i, EDIT_TIMEOUT_MS]);
    if (r.error) errors.push(r.error);
    else times.push(r.ms);
    await page.waitForTimeout(30);
  }
  return { times, errors };
}

try {
  browser = await openPreviewBrowser({ root: ROOT, distDir: DIST, port: process.env.COOLSTAGE_BENCH_PORT ? Number(process.env.COOLSTAGE_BENCH_PORT) : undefined });
  BASE_URL = browser.baseUrl;
  const context = browser.context;
  const page = await context.newPage();
  await page.addInitScript(MEASURE_EDIT);

  const fetchedJs = new Set();
  page.on('response', (r) => {
    const m = /\/assets\/([^/?#]+\.js)/.exec(r.url());
    if (m) fetchedJs.add(m[1]);
  });
  const loads = [];
  for (let i = 0; i < LOAD_COUNT; i++) {
    await openFresh(page);
    await page.reload();
    loads.push(await page.evaluate(FIRST_CHART));
  }

  const firstLoadJs = [...fetchedJs];
  const beforePlotlyFiles = firstLoadJs.filter((f) => !isPlotly(f));
  const workerFiles = beforePlotlyFiles.filter((f) => f.startsWith('engineWorker'));
  const before = sum(beforePlotlyFiles);
  const mainThreadBefore = sum(beforePlotlyFiles.filter((f) => !workerFiles.includes(f)));

  // 1-D: the demo plan; edit the last stage's h (it ends on a temperature, so the curve moves).
  await openFresh(page);
  await page.reload();
  await page.evaluate(FIRST_CHART);
  await page.getByRole('listbox', { name: 'Stages in order' }).getByRole('option').last().click();
  const oneD = await measureEdits(page, 'Heat transfer coefficient h');

  // 2-D: the same plan as a short cylinder (finite-volume 2-D).
  await page.getByLabel('Shape', { exact: true }).selectOption('short-cylinder');
  await page.getByText(/Results up to date/).waitFor({ timeout: 60_000 });
  const twoD = await measureEdits(page, 'Heat transfer coefficient h');

  const ms = (x) => (x === undefined ? '—' : `${x.toFixed(0)} ms`);
  const kb = (b) => `${(b / KB).toFixed(1)} KB`;
  const verdict = (ok) => (ok ? 'within budget' : 'OVER BUDGET');
  const line = (what, figure, budget, ok) => console.log(`${what.padEnd(42)} ${figure.padEnd(30)} budget ${budget.padEnd(10)} ${verdict(ok)}`);
  console.log(`\nCoolstage browser benchmark (${new Date().toISOString()}, Chromium headless, ${EDIT_COUNT} edits, ${LOAD_COUNT} loads)\n`);
  for (const [label, r, budget] of [['edit -> chart, demo plan (1-D)', oneD, BUDGET.edit1DP95Ms], ['edit -> chart, short cylinder (2-D)', twoD, BUDGET.edit2DP95Ms]]) {
    const p95 = quantile(r.times, 0.95);
    line(label, `median ${ms(quantile(r.times, 0.5))}, p95 ${ms(p95)}`, `p95 ${budget} ms`, r.errors.length === 0 && p95 < budget);
    if (r.errors.length) console.log(`    ${r.errors.length} of ${EDIT_COUNT} edits failed: ${[...new Set(r.errors)].join('; ')}`);
  }
  const firstChart = quantile(loads, 0.5);
  line('load -> first chart (localhost)', `median ${ms(firstChart)} (max ${ms(Math.max(...loads))})`, `${BUDGET.firstChartMs} ms`, firstChart < BUDGET.firstChartMs);
  line('JS before plotly, worker included', `${kb(before.raw)} / ${kb(before.gzip)}`, `${BUDGET.beforePlotlyGzipKB} KB gz`, before.gzip < BUDGET.beforePlotlyGzipKB * KB);
  line('  of which UI thread (worker left out)', `${kb(mainThreadBefore.raw)} / ${kb(mainThreadBefore.gzip)}`, `${BUDGET.beforePlotlyGzipKB} KB gz`, mainThreadBefore.gzip < BUDGET.beforePlotlyGzipKB * KB);
  line('JS in all (raw / gzip)', `${kb(all.raw)} / ${kb(all.gzip)}`, `${BUDGET.allGzipKB} KB gz`, all.gzip < BUDGET.allGzipKB * KB);
  console.log(`\nfetched by a cold load, besides plotly: ${beforePlotlyFiles.join(', ')}\nplotly, loaded lazily: ${firstLoadJs.filter(isPlotly).join(', ') || '(not fetched)'}`);
} finally {
  await browser?.close();
}
