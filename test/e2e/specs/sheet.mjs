// The stage sheet printed with Chromium's own PDF printer, A4 and US Letter, read back with
// poppler (pdftotext -raw keeps each cell's words together; pdfinfo): every stage, every warning and the cautions are in the text,
// tables and the chart are not split across pages, nothing runs off the paper, and no screen
// control is printed. Page images (pdftoppm) go to test/e2e/out/ for a person to look at.
import { execFileSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';

export const name = 'sheet: print to PDF (A4, Letter) with every stage, warning and caution, nothing cut';

const HERE = dirname(fileURLToPath(import.meta.url));
const OUT = join(HERE, '..', 'out');
const ROOT = join(HERE, '..', '..', '..');
/** Words may come within this many points of the paper's edge; the sheet's own margin is 34 pt or more. */
const EDGE_ALLOWANCE_PT = 20;

export const squash = (s) => s.replace(/\s+/g, '');

/** The demo plan with one variant whose last stage is an agitated water bath, as a version-2 file. */
function documentFile() {
  const demo = JSON.parse(readFileSync(join(ROOT, 'src', 'library', 'plans', 'demo-plan.json'), 'utf8'));
  const { format, version, temperatureUnit, ...main } = demo;
  // Radiation left out of the hot transfer in air: the engine warns about it, so the sheet has warnings to print.
  delete main.stages[0].medium.radiation;
  const bath = structuredClone(main);
  const last = bath.stages.length - 1;
  bath.name = 'Bath for the last stage';
  bath.stages[last].medium = { name: 'Water, agitated (sheet test)', temperature: 25, heatTransfer: { kind: 'constant', hWPerM2K: 3000 } };
  return JSON.stringify({ format, version: 2, temperatureUnit, main, variants: [{ id: 'v1', name: 'Bath for the last stage', plan: bath }], sheet: { revision: 'C', preparedBy: 'E2E Tester', checkedBy: '', date: '2026-12-01' } });
}

export function pdfPages(pdfPath) {
  const info = execFileSync('pdfinfo', [pdfPath], { encoding: 'utf8' });
  const pages = Number(info.match(/Pages:\s+(\d+)/)[1]);
  const [, w, h] = info.match(/Page size:\s+([\d.]+) x ([\d.]+) pts/);
  const texts = Array.from({ length: pages }, (_, i) => execFileSync('pdftotext', ['-raw', '-f', String(i + 1), '-l', String(i + 1), pdfPath, '-'], { encoding: 'utf8' }));
  const bbox = execFileSync('pdftotext', ['-bbox', pdfPath, '-'], { encoding: 'utf8' });
  const xMax = Math.max(...[...bbox.matchAll(/xMax="([\d.]+)"/g)].map((m) => Number(m[1])));
  return { pages, widthPt: Number(w), heightPt: Number(h), texts, xMax };
}

async function printAndCheck(page, paper, expected) {
  await page.getByTestId('sheet-paper').selectOption(paper);
  await page.waitForFunction((p) => document.querySelector('[data-testid="sheet-page"]')?.dataset.paper === p, paper);
  const pdfPath = join(OUT, `sheet-${paper}.pdf`);
  writeFileSync(pdfPath, await page.pdf({ preferCSSPageSize: true, printBackground: true }));
  const pdf = pdfPages(pdfPath);
  const where = `${paper} PDF (${pdf.pages} pages)`;
  const expectedSize = paper === 'a4' ? [595, 842] : [612, 792];
  if (Math.abs(pdf.widthPt - expectedSize[0]) > 2 || Math.abs(pdf.heightPt - expectedSize[1]) > 2) throw new Error(`${where}: page is ${pdf.widthPt} x ${pdf.heightPt} pt, expected ${expectedSize.join(' x ')} (portrait)`);
  const all = squash(pdf.texts.join('\n'));
  const missing = [...expected.stages, ...expected.warnings, ...expected.cautions, ...expected.always].filter((t) => !all.includes(squash(t)));
  if (missing.length) throw new Error(`${where}: missing from the text:\n  ${missing.join('\n  ')}`);
  if (all.includes(squash('not cross-checked by a second method'))) throw new Error(`${where}: printed from the quick pass, before the cross-checked results`);
  const controls = ['Print or save as PDF', 'Back to the workbench', 'Share link', 'Export CSV'].filter((t) => all.includes(squash(t)));
  if (controls.length) throw new Error(`${where}: screen controls printed: ${controls.join(', ')}`);
  if (pdf.xMax > pdf.widthPt - EDGE_ALLOWANCE_PT) throw new Error(`${where}: text reaches x = ${pdf.xMax} pt on a ${pdf.widthPt} pt page (cut off at the right)`);
  // Tables and the chart each on one page.
  const onOnePage = (label, parts) => {
    const page = pdf.texts.findIndex((t) => parts.every((p) => squash(t).includes(squash(p))));
    if (page < 0) throw new Error(`${where}: ${label} is split across pages or missing; looked for ${JSON.stringify(parts)} on one page`);
  };
  onOnePage('the comparison table', ['Variants compared', 'Stage 1 duration', 'Total cycle time', 'End temperature, centre', 'Largest surface cooling rate', 'Heat removed', 'Methods', 'Bath for the last stage']);
  onOnePage('the chart', ['Temperatures over the whole plan', 'Time (', 'Temperature (']);
  expected.stages.forEach((stage, i) => onOnePage(`stage row ${i + 1}`, [stage, expected.stageMedia[i]]));
  onOnePage('the stage table header', ['Stage and medium', 'Bi (V/A)', 'Bi (series)', 'Fo at end']);
  onOnePage('the title block', ['Cooling stage sheet', 'Revision', 'C', 'Prepared by', 'E2E Tester', 'Checked by']);
  // The chart is vector: the PDF holds no raster image at all.
  const images = execFileSync('pdfimages', ['-list', pdfPath], { encoding: 'utf8' }).trim().split('\n').slice(2);
  if (images.length) throw new Error(`${where}: the PDF holds ${images.length} raster image(s); the chart should be vector:\n${images.join('\n')}`);
  execFileSync('pdftoppm', ['-png', '-r', '60', pdfPath, join(OUT, `sheet-${paper}-page`)]);
  return pdf;
}

export async function run({ page, baseUrl, shot }) {
  for (const tool of ['pdftotext', 'pdfinfo', 'pdfimages', 'pdftoppm']) {
    try {
      execFileSync(tool, ['-v'], { stdio: 'ignore' });
    } catch {
      throw new Error(`the sheet spec reads the PDF with poppler's ${tool}; install poppler-utils (Debian: apt-get install poppler-utils)`);
    }
  }
  await page.goto(baseUrl);
  await page.getByTestId('open-file-input').setInputFiles({ name: 'sheet-test.coolstage.json', mimeType: 'application/json', buffer: Buffer.from(documentFile()) });
  await page.getByTestId('exchange-notice').getByText('Opened').waitFor();
  await page.goto(`${baseUrl}#/sheet`);
  await page.waitForSelector('[data-testid="sheet-page"][data-ready="yes"]', { timeout: 40_000 });
  await shot('sheet-screen');

  const expected = await page.evaluate(() => {
    const rows = [...document.querySelectorAll('[data-testid^="sheet-stage-"]')];
    return {
      stages: rows.map((r) => r.querySelector('td:nth-child(2) strong').textContent),
      stageMedia: rows.map((r) => r.querySelector('.cs-sheet-medium-name').textContent),
      warnings: [...document.querySelectorAll('.cs-sheet-warning')].map((w) => w.textContent.trim()),
      cautions: [...document.querySelectorAll('[data-testid="sheet-cautions"] li')].map((li) => li.textContent.trim()),
      always: ['Cooling stage sheet', 'Part and start', 'Initial state', 'Assumptions', 'Safety cautions'],
    };
  });
  if (expected.stages.length < 3) throw new Error(`the sheet shows ${expected.stages.length} stages`);
  if (expected.warnings.length < 1) throw new Error('the sheet shows no warnings; the plan was built to raise at least one');
  if (expected.cautions.length < 7) throw new Error(`the sheet shows ${expected.cautions.length} cautions`);
  for (const topic of ['Hot parts', 'Quench-oil fire', 'Steam', 'Cracking', 'Handling', 'procedures']) {
    if (!expected.cautions.some((c) => c.includes(topic))) throw new Error(`no caution about "${topic}" in ${JSON.stringify(expected.cautions)}`);
  }
  const a4 = await printAndCheck(page, 'a4', expected);
  const letter = await printAndCheck(page, 'letter', expected);
  console.log(`    sheet: ${expected.stages.length} stages, ${expected.warnings.length} warnings, ${expected.cautions.length} cautions; A4 ${a4.pages} pages, Letter ${letter.pages} pages`);
}
