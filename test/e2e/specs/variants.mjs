// Variants in Chromium: copy the demo plan, swap its last air stage for a liquid bath, and check
// that the comparison table has figures for both plans and that the variant's curves are drawn
// over the main plan's, named in the legend and drawn with their own dash pattern.
import { readFileSync } from 'node:fs';

/** Start from the bundled demo plan (a version-1 file), whatever an earlier spec left in the autosave. */
const DEMO_PLAN = readFileSync(new URL('../../../src/library/plans/demo-plan.json', import.meta.url), 'utf8');

export const name = 'variants: swap an air stage for a liquid bath, compare and overlay';

export async function run({ page, baseUrl, shot }) {
  await page.goto(`${baseUrl}#/variants`);
  await page.getByTestId('variants-screen').waitFor();
  await page.getByTestId('open-file-input').setInputFiles({ name: 'demo-plan.json', mimeType: 'application/json', buffer: Buffer.from(DEMO_PLAN) });
  await page.getByTestId('exchange-notice').getByText('a version-1 file, brought up to date').waitFor();
  if ((await page.locator('[data-testid^="variant-v"]').count()) !== 0) throw new Error('the demo plan opened with variants');
  await page.getByTestId('add-variant').click();
  const card = page.getByTestId('variant-v1');
  await card.waitFor();

  // The demo's stages: find the last one in still air and give it an agitated water bath.
  const selects = card.locator('select[data-testid^="variant-medium-"]');
  const count = await selects.count();
  let swapped = -1;
  for (let i = count - 1; i >= 0; i--) {
    const value = await selects.nth(i).inputValue();
    if (value.includes('air')) {
      swapped = i;
      break;
    }
  }
  if (swapped < 0) throw new Error(`no air stage found among ${count} stages of the demo plan`);
  await selects.nth(swapped).selectOption('agitated-water');
  if ((await selects.nth(swapped).inputValue()) !== 'agitated-water') throw new Error('the medium did not change');
  await card.getByTestId('variant-name').fill('Bath instead of air');
  await card.getByTestId('variant-name').press('Enter');

  // Both columns computed (no "computing…" left) from the swapped plan: wait until the engine has
  // answered for the change (results up to date) and the swapped stage's row has been redrawn.
  const table = page.getByTestId('comparison-table');
  await page.getByText('Results up to date').waitFor({ timeout: 30_000 });
  await page.waitForFunction((label) => {
    const t = document.querySelector('[data-testid="comparison-table"]');
    if (!t || t.textContent.includes('computing') || t.querySelectorAll('thead th').length !== 3) return false;
    const row = [...t.querySelectorAll('tbody tr')].find((tr) => tr.children[0].textContent === label);
    return row && row.children[1].textContent !== row.children[2].textContent;
  }, `Stage ${swapped + 1} duration`, { timeout: 30_000 }).catch(async () => {
    throw new Error(`stage ${swapped + 1} never differed between the plans: ${await table.textContent()}`);
  });
  const headers = await table.locator('thead th').allTextContents();
  if (!headers[2].includes('Bath instead of air')) throw new Error(`comparison headers: ${JSON.stringify(headers)}`);
  const rows = await table.locator('tbody tr').evaluateAll((trs) => trs.map((tr) => [...tr.children].map((c) => c.textContent.trim())));
  const row = (label) => {
    const r = rows.find((x) => x[0] === label);
    if (!r) throw new Error(`no "${label}" row in ${JSON.stringify(rows.map((x) => x[0]))}`);
    return r;
  };
  for (const label of ['Total cycle time', 'End temperature, centre', 'End temperature, surface', 'End temperature, mean', 'Largest surface cooling rate', 'Largest centre–surface difference', 'Heat removed', 'Methods']) {
    const [, main, variant] = row(label);
    if (!main || !variant || main === '—' || variant === '—') throw new Error(`${label}: main "${main}", variant "${variant}"`);
  }
  const stageRow = row(`Stage ${swapped + 1} duration`);
  if (stageRow[1] === stageRow[2]) throw new Error(`the swapped stage ${swapped + 1} lasts the same in both plans: ${stageRow[1]}`);
  // A liquid bath takes heat far faster than still air: the swapped stage is shorter.
  // Durations read as the workbench writes them: "12.5 s", "3 min 05 s", "1 h 45 min".
  const seconds = (text) => [...text.matchAll(/([\d.]+) (h|min|s)\b/g)].reduce((sum, [, v, unit]) => sum + Number(v) * { h: 3600, min: 60, s: 1 }[unit], 0);
  const mainS = seconds(stageRow[1].split(': ').pop());
  const variantS = seconds(stageRow[2].split(': ').pop());
  if (!(variantS > 0 && variantS < mainS)) throw new Error(`stage ${swapped + 1}: bath ${variantS} s should be shorter than air ${mainS} s (${stageRow.join(' | ')})`);

  // Overlaid curves: the legend names the variant's centre and surface; their lines are dashed or dotted.
  await page.waitForFunction(() => [...document.querySelectorAll('.legendtext')].some((t) => t.textContent.includes('Bath instead of air')), null, { timeout: 20_000 });
  const legend = await page.locator('.legendtext').allTextContents();
  const variantTraces = legend.filter((t) => t.startsWith('Bath instead of air'));
  if (variantTraces.length !== 2) throw new Error(`legend: ${JSON.stringify(legend)}`);
  // The graph div carries the traces plotly drew: the variant's are dashed/dotted with their own markers, and drawn.
  const drawn = await page.evaluate(() => {
    const gd = document.querySelector('[data-testid="variants-screen"] [data-testid="plot"]');
    const paths = [...gd.querySelectorAll('.scatterlayer .trace')].map((t) => t.querySelector('path.js-line')?.getAttribute('d') ?? '');
    return gd.data.map((t, i) => ({ name: t.name, dash: t.line?.dash, marker: t.marker?.symbol, points: t.x.length, path: paths[i]?.length ?? 0 }));
  });
  const mine = drawn.filter((t) => t.name.startsWith('Bath instead of air'));
  const mainCentre = drawn[0];
  if (mine.length !== 2 || mine.some((t) => t.dash === 'solid' || !t.marker || t.points < 2 || t.path < 10)) throw new Error(`variant traces: ${JSON.stringify(mine)}`);
  if (mine.some((t) => t.marker === mainCentre.marker && t.dash === mainCentre.dash)) throw new Error(`a variant trace looks like the main centre trace: ${JSON.stringify(drawn)}`);
  await shot('variants');
}
