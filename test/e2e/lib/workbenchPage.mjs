// Helpers the workbench specs share: open a clean workbench, wait for fresh results, read the chain and the chart.

/** Open the app with nothing saved (the demo plan) and wait for its first results and chart. */
export async function openCleanWorkbench(page, baseUrl) {
  await page.goto(baseUrl);
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await waitForResults(page);
  await waitForChart(page);
}

export async function waitForResults(page) {
  await page.getByText(/Results up to date/).waitFor({ timeout: 20_000 });
}

const HISTORY_TRACE = 'figure[aria-label^="Temperature against time"] .scatterlayer .trace path.js-line';

export async function waitForChart(page) {
  await page.locator(HISTORY_TRACE).first().waitFor({ timeout: 20_000 });
}

/** The drawn path of every temperature-history trace, to tell whether the plotted curves changed. */
export async function historyPaths(page) {
  return page.locator(HISTORY_TRACE).evaluateAll((paths) => paths.map((p) => p.getAttribute('d') ?? ''));
}

export function stageBlocks(page) {
  return page.getByRole('listbox', { name: 'Stages in order' }).getByRole('option');
}

export async function stageNames(page) {
  return stageBlocks(page).evaluateAll((els) => els.map((el) => el.querySelector('.stage-title')?.textContent?.replace(/^\d+\s*/, '').replace(/ \(selected\)$/, '').trim()));
}

/** The "takes ..." text of a block (index from 0). */
export async function stageDurationText(page, index) {
  return (await stageBlocks(page).nth(index).locator('.stage-duration').textContent())?.trim();
}

export function assert(condition, message) {
  if (!condition) throw new Error(message);
}

/**
 * Wait until a field's text passes a check. A field rewrites its text in an effect after the store
 * (or the unit system) changes, a frame after the key press, so reading it at once races the render.
 */
export async function waitForInput(locator, check, message, timeoutMs = 3000) {
  const until = Date.now() + timeoutMs;
  let value = await locator.inputValue();
  while (!check(value) && Date.now() < until) {
    await new Promise((r) => setTimeout(r, 25));
    value = await locator.inputValue();
  }
  assert(check(value), `${message} (the field shows ${JSON.stringify(value)})`);
  return value;
}

export const waitForInputValue = (locator, expected, message) => waitForInput(locator, (v) => v === expected, `${message}; expected ${JSON.stringify(expected)}`);
