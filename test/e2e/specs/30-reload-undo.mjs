// Reload and find the plan still there; undo an edit with the keyboard and the button.
import { assert, openCleanWorkbench, waitForChart, waitForInputValue, waitForResults } from '../lib/workbenchPage.mjs';

export const name = 'reload keeps the plan; undo takes an edit back';

export async function run({ page, baseUrl, shot }) {
  await openCleanWorkbench(page, baseUrl);
  const plan = page.getByLabel('Plan', { exact: true });
  const original = await plan.inputValue();
  await plan.fill('Reload check plan');
  const diameter = page.getByLabel('Diameter (mm)');
  await diameter.fill('55');
  await diameter.blur();
  await page.reload();
  await waitForResults(page);
  assert((await page.getByLabel('Plan', { exact: true }).inputValue()) === 'Reload check plan', 'the plan name was lost on reload');
  assert((await page.getByLabel('Diameter (mm)').inputValue()) === '55', `diameter after reload: ${await page.getByLabel('Diameter (mm)').inputValue()}`);
  await waitForChart(page);
  await shot('after-reload');
  // Undo history is per session; make an edit, then take it back with Ctrl+Z.
  await page.getByLabel('Diameter (mm)').fill('60');
  await page.locator('body').click({ position: { x: 5, y: 5 } });
  const diameterField = page.getByLabel('Diameter (mm)');
  await page.keyboard.press('Control+z');
  await waitForInputValue(diameterField, '55', 'Ctrl+Z did not undo the diameter');
  await page.keyboard.press('Control+Shift+z');
  await waitForInputValue(diameterField, '60', 'Ctrl+Shift+Z did not redo');
  await page.getByRole('button', { name: '↶ Undo' }).click();
  await waitForInputValue(diameterField, '55', 'the Undo button did not undo');
  await page.reload();
  await waitForResults(page);
  assert((await page.getByLabel('Diameter (mm)').inputValue()) === '55', 'the undone state was not what reload brought back');
  assert(original !== 'Reload check plan', 'test needs a demo name different from the edited one');
}
