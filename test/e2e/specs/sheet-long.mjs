// A long plan on paper: 24 stages make the stage table run over pages. Each row stays whole on one
// page and the table's header is printed again at the top of every page the table reaches.
import { writeFileSync, readFileSync } from 'node:fs';
import { execFileSync } from 'node:child_process';
import { pdfPages, squash } from './sheet.mjs';

export const name = 'sheet: a 24-stage plan runs over pages with whole rows and repeated headers';

const STAGES = 24;
const HEADER = ['Stage and medium', 'Heat transfer', 'Fo at end'];
const DEMO = JSON.parse(readFileSync(new URL('../../../src/library/plans/demo-plan.json', import.meta.url), 'utf8'));
const AIR = DEMO.stages[0];
const stageName = (i) => `Hold step ${String(i).padStart(2, '0')}`;
/** A row's first cell holds the stage name then its medium; the chart and the warnings name the stage alone. */
const rowText = (i) => squash(`${stageName(i)} ${AIR.medium.name}`);

function longPlanFile() {
  const { note, ...air } = AIR;
  const stages = Array.from({ length: STAGES }, (_, i) => ({ ...air, name: stageName(i + 1), end: { kind: 'duration', seconds: 10 } }));
  return JSON.stringify({ ...DEMO, name: 'Long chain of short air holds', stages });
}

export async function run({ page, baseUrl }) {
  await page.goto(baseUrl);
  await page.getByTestId('open-file-input').setInputFiles({ name: 'long.json', mimeType: 'application/json', buffer: Buffer.from(longPlanFile()) });
  await page.getByTestId('exchange-notice').getByText('Opened').waitFor();
  await page.goto(`${baseUrl}#/sheet`);
  await page.waitForSelector('[data-testid="sheet-page"][data-ready="yes"]', { timeout: 40_000 });
  const pdfPath = new URL('../out/sheet-long-a4.pdf', import.meta.url).pathname;
  writeFileSync(pdfPath, await page.pdf({ preferCSSPageSize: true, printBackground: true }));
  const pdf = pdfPages(pdfPath);
  const pages = pdf.texts.map(squash);
  for (let i = 1; i <= STAGES; i++) {
    const on = pages.filter((t) => t.includes(rowText(i))).length;
    if (on !== 1) throw new Error(`stage row ${i} is on ${on} pages`);
  }
  const withRows = pages.map((text, p) => ({ p, text })).filter(({ text }) => Array.from({ length: STAGES }, (_, i) => rowText(i + 1)).some((r) => text.includes(r)));
  if (withRows.length < 2) throw new Error(`the stage table fits on ${withRows.length} page; the test needs it to cross a page`);
  for (const { p, text } of withRows) {
    const missing = HEADER.filter((h) => !text.includes(squash(h)));
    if (missing.length) throw new Error(`page ${p + 1} has stage rows but no table header (${missing.join(', ')})`);
  }
  execFileSync('pdftoppm', ['-png', '-r', '50', '-f', '1', '-l', '2', pdfPath, new URL('../out/sheet-long-page', import.meta.url).pathname]);
}
