// Edit a stage's h and see the reported duration and the plotted curve change.
import { assert, historyPaths, openCleanWorkbench, stageBlocks, stageDurationText, waitForResults } from '../lib/workbenchPage.mjs';

export const name = 'editing h changes the reported duration and the plotted curve';

export async function run({ page, baseUrl, shot }) {
  await openCleanWorkbench(page, baseUrl);
  await shot('demo-opened');
  // The demo's last stage ends on a temperature, so its duration depends on h.
  const last = (await stageBlocks(page).count()) - 1;
  await stageBlocks(page).nth(last).click();
  const before = await stageDurationText(page, last);
  const pathsBefore = await historyPaths(page);
  const h = page.getByLabel('Heat transfer coefficient h (W/(m²·K))');
  const hBefore = Number(await h.inputValue());
  await h.fill(String(hBefore * 3));
  await page.waitForFunction((old) => document.querySelectorAll('.stage-duration')[document.querySelectorAll('.stage-duration').length - 1]?.textContent?.trim() !== old, before, { timeout: 20_000 });
  await waitForResults(page);
  const after = await stageDurationText(page, last);
  assert(after !== before, `duration did not change: h ${hBefore} -> ${hBefore * 3} W/m²K, duration before "${before}", after "${after}"`);
  await page.waitForFunction((old) => {
    const now = [...document.querySelectorAll('figure[aria-label^="Temperature against time"] .scatterlayer .trace path.js-line')].map((p) => p.getAttribute('d'));
    return now.join('|') !== old;
  }, pathsBefore.join('|'), { timeout: 20_000 });
  const pathsAfter = await historyPaths(page);
  assert(pathsAfter.length > 0 && pathsAfter.some((d, i) => d !== pathsBefore[i]), 'the plotted curve did not change');
  await shot('h-tripled');
}
