// Files, links and exports in Chromium: plan -> file -> plan and plan -> link -> plan unchanged,
// CSV columns and units, PNG and SVG images, and every bad file or link refused with its fields
// named while the plan stays as it was.
import { readFileSync, writeFileSync } from 'node:fs';

/** Start from the bundled demo plan (a version-1 file), whatever an earlier spec left in the autosave. */
const DEMO_PLAN = readFileSync(new URL('../../../src/library/plans/demo-plan.json', import.meta.url), 'utf8');

export const name = 'exchange: file and link round trips, CSV, PNG, SVG, bad files and links';

async function download(page, click) {
  const [file] = await Promise.all([page.waitForEvent('download'), click()]);
  return { name: file.suggestedFilename(), bytes: readFileSync(await file.path()) };
}

const save = async (page) => (await download(page, () => page.getByRole('button', { name: 'Save', exact: true }).click())).bytes.toString('utf8');

async function waitForResults(page) {
  await page.getByText('Results up to date').waitFor({ timeout: 30_000 });
}

async function openText(page, text, fileName = 'plan.coolstage.json') {
  await page.getByTestId('open-file-input').setInputFiles({ name: fileName, mimeType: 'application/json', buffer: Buffer.from(text) });
  await page.getByTestId('exchange-notice').waitFor();
  return (await page.getByTestId('exchange-notice').textContent()) ?? '';
}

export async function run({ page, baseUrl, shot, context }) {
  await page.goto(`${baseUrl}#/variants`);
  const migrated = await openText(page, DEMO_PLAN, 'demo-plan.json');
  if (!migrated.includes('a version-1 file, brought up to date')) throw new Error(`opening the version-1 demo plan: ${migrated}`);
  await page.getByTestId('exchange-notice').getByRole('button', { name: 'Dismiss' }).click();
  await page.getByTestId('add-variant').click();
  await page.getByTestId('variant-v1').waitFor();
  await waitForResults(page);

  // Plan -> file -> plan.
  const saved = await save(page);
  const file = JSON.parse(saved);
  if (file.format !== 'coolstage-plan' || file.version !== 2 || file.variants.length !== 1) throw new Error(`saved file: format ${file.format}, version ${file.version}, ${file.variants?.length} variants`);
  await page.getByTestId('variant-v1').getByRole('button', { name: 'Remove' }).click();
  await page.getByTestId('variant-v1').waitFor({ state: 'detached' });
  const opened = await openText(page, saved);
  if (!opened.includes('Opened')) throw new Error(`opening the saved file: ${opened}`);
  await page.getByTestId('variant-v1').waitFor();
  const resaved = await save(page);
  if (resaved !== saved) throw new Error('plan -> file -> plan changed the plan (the file saved again differs)');

  // Every bad file: refused, fields named, nothing changed.
  const badFiles = [
    ['malformed', '{"format": "coolstage-plan", "version": 2,, }', '(file): not valid JSON'],
    ['truncated', saved.slice(0, Math.floor(saved.length / 3)), 'may be truncated'],
    ['oversized', `{"format":"coolstage-plan","version":2,"pad":"${'x'.repeat(3_000_000)}"}`, 'a plan file may be at most 2 MB'],
    ['newer version', saved.replace('"version": 2', '"version": 9'), 'version: this file is version 9'],
    ['wrong format', saved.replace('"format": "coolstage-plan"', '"format": "some-other-tool"'), 'format: format must be "coolstage-plan"'],
    ['bad field', saved.replace('"radiusM": 0.02', '"radiusM": "wide"'), 'main.part.shape.radiusM'],
  ];
  for (const [label, text, expected] of badFiles) {
    const notice = await openText(page, text, `${label}.json`);
    if (!notice.includes(expected) || !notice.includes('Nothing was changed.')) throw new Error(`${label} file: expected "${expected}", the notice says: ${notice.slice(0, 300)}`);
    if ((await save(page)) !== saved) throw new Error(`${label} file changed the plan`);
    await page.getByTestId('exchange-notice').getByRole('button', { name: 'Dismiss' }).click();
  }
  await openText(page, badFiles[5][1], 'bad-field.json');
  await shot('bad-file');
  await page.getByTestId('exchange-notice').getByRole('button', { name: 'Dismiss' }).click();

  // CSV: header with units, one row per sample, starting at the initial temperature.
  await page.goto(`${baseUrl}#/`);
  await waitForResults(page);
  const csv = (await download(page, () => page.getByRole('button', { name: 'Export CSV' }).click())).bytes.toString('utf8');
  const lines = csv.trimEnd().split('\r\n');
  const header = lines[0].split(',');
  if (header[0] !== 'time from plan start [s]' || header[1] !== 'time in stage [s]' || header[2] !== 'stage' || header[3] !== 'stage name') throw new Error(`CSV header: ${lines[0]}`);
  const temperatureColumns = header.slice(4);
  if (!temperatureColumns.length || !temperatureColumns.every((h) => h.endsWith('[degC]'))) throw new Error(`CSV temperature columns: ${temperatureColumns}`);
  for (const id of ['centre', 'surface', 'mean']) if (!temperatureColumns.some((h) => h.startsWith(id))) throw new Error(`CSV has no ${id} column: ${lines[0]}`);
  const first = lines[1].split(',');
  const initialC = file.main.initialTemperature;
  if (first[0] !== '0' || first.slice(4).some((v) => Math.abs(Number(v) - initialC) > 1e-6)) throw new Error(`CSV first row ${lines[1]}, expected time 0 at ${initialC} degC everywhere`);
  const stagesInCsv = new Set(lines.slice(1).map((l) => l.split(',')[2]));
  if (stagesInCsv.size !== file.main.stages.length) throw new Error(`CSV covers stages ${[...stagesInCsv]} of ${file.main.stages.length}`);
  const times = lines.slice(1).map((l) => Number(l.split(',')[0]));
  if (times.some((t, i) => i > 0 && t < times[i - 1])) throw new Error('CSV times go backwards');

  // PNG and SVG of the chart.
  const png = await download(page, () => page.getByRole('button', { name: 'PNG', exact: true }).click());
  if (!png.name.endsWith('.png') || png.bytes.subarray(0, 4).toString('hex') !== '89504e47' || png.bytes.length < 10_000) throw new Error(`PNG: ${png.name}, ${png.bytes.length} bytes, starts ${png.bytes.subarray(0, 4).toString('hex')}`);
  // Kept beside the screenshots for a person to look at.
  writeFileSync(new URL('../out/exchange-chart.png', import.meta.url), png.bytes);
  const svg = await download(page, () => page.getByRole('button', { name: 'SVG', exact: true }).click());
  const svgText = svg.bytes.toString('utf8');
  if (!svg.name.endsWith('.svg') || !svgText.startsWith('<svg') || !svgText.includes('Temperature (') || !svgText.includes('js-line')) throw new Error(`SVG: ${svg.name}, starts ${svgText.slice(0, 60)}`);

  // Plan -> link -> plan: the link opens in a new tab, asks, and gives back the same plan.
  await page.getByRole('button', { name: 'Share link' }).click();
  const url = await page.getByTestId('share-link-url').inputValue();
  if (!url.startsWith(baseUrl) || !/#plan=[A-Za-z0-9_-]+$/.test(url)) throw new Error(`share link: ${url.slice(0, 120)}`);
  const other = await context.newPage();
  try {
    await other.goto(url);
    await other.getByTestId('link-prompt').waitFor();
    await other.getByRole('button', { name: 'Open the linked plan' }).click();
    if ((await save(other)) !== saved) throw new Error('plan -> link -> plan changed the plan');
    if (!(await other.evaluate(() => location.hash === '#/'))) throw new Error('the link fragment was left in the address bar');

    // Tampered links: cut short, and one character changed in the middle.
    const fragment = url.slice(url.indexOf('#') + 1);
    const middle = Math.floor(fragment.length / 2);
    const flipped = fragment.slice(0, middle) + (fragment[middle] === 'A' ? 'B' : 'A') + fragment.slice(middle + 1);
    for (const [label, bad] of [['cut', fragment.slice(0, Math.floor(fragment.length * 0.6))], ['altered', flipped], ['not base64url', `${fragment}%21`]]) {
      await other.goto(`${baseUrl}#${bad}`);
      await other.reload();
      const refused = other.getByTestId('link-refused');
      await refused.waitFor();
      const text = (await refused.textContent()) ?? '';
      if (!text.includes('Nothing was changed.')) throw new Error(`${label} link: ${text}`);
      if (label === 'cut') await other.screenshot({ path: new URL('../out/exchange-tampered-link.png', import.meta.url).pathname });
      await refused.getByRole('button', { name: 'Close' }).click();
      if ((await save(other)) !== saved) throw new Error(`${label} link changed the plan`);
    }
  } finally {
    await other.close();
  }
}
