// A long computation (the demo as a short cylinder, a 2-D grid) shows progress and can be stopped;
// "Compute again" brings the (quick) results back. The page stays responsive meanwhile.
import { assert, openCleanWorkbench } from '../lib/workbenchPage.mjs';

export const name = 'a long run shows progress and can be stopped';

export async function run({ page, baseUrl, shot }) {
  await openCleanWorkbench(page, baseUrl);
  await page.getByLabel('Shape', { exact: true }).selectOption('short-cylinder');
  const progress = page.getByRole('progressbar', { name: 'Computation progress' });
  await progress.waitFor({ timeout: 10_000 });
  // The UI thread answers while the worker computes: typing in a field is echoed at once.
  const name = page.getByLabel('Stage name');
  const t0 = Date.now();
  await name.fill('Transfer, checked while computing');
  const typedMs = Date.now() - t0;
  await shot('progress');
  await page.getByRole('button', { name: 'Stop' }).click();
  await page.getByText(/■ Stopped/).waitFor({ timeout: 5_000 });
  assert(!(await progress.isVisible()), 'progress still shown after Stop');
  await shot('stopped');
  await page.getByRole('button', { name: 'Compute again' }).click();
  // The quick answer comes back first; the 2-D cross-check can take long, so it is stopped again.
  await page.getByText(/Quick results shown|Results up to date/).waitFor({ timeout: 30_000 });
  assert(!(await page.getByText(/■ Stopped/).isVisible()), 'still says stopped after Compute again');
  if (await page.getByRole('button', { name: 'Stop' }).isVisible()) await page.getByRole('button', { name: 'Stop' }).click();
  assert(typedMs < 2_000, `typing into a field took ${typedMs} ms while the worker was busy`);
}
