// Add a stage and reorder stages with the keyboard and the buttons.
import { assert, openCleanWorkbench, stageBlocks, stageNames, waitForResults } from '../lib/workbenchPage.mjs';

export const name = 'adding and reordering stages';

export async function run({ page, baseUrl, shot }) {
  await openCleanWorkbench(page, baseUrl);
  const start = await stageNames(page);
  await stageBlocks(page).nth(0).click();
  await page.getByRole('button', { name: '+ Add stage after' }).click();
  const added = await stageNames(page);
  assert(added.length === start.length + 1, `expected ${start.length + 1} stages after adding, got ${added.length}: ${added.join(', ')}`);
  assert(added[0] === start[0] && added[2] === start[1], `new stage not inserted after the first: ${added.join(', ')}`);
  const newName = added[1];
  // Keyboard: the new stage is selected and focused; Alt+ArrowRight moves it one later.
  await stageBlocks(page).nth(1).focus();
  await page.keyboard.press('Alt+ArrowRight');
  let names = await stageNames(page);
  assert(names[2] === newName, `Alt+ArrowRight did not move "${newName}" to place 3: ${names.join(', ')}`);
  const focusedIsMoved = await page.evaluate(() => document.activeElement?.getAttribute('aria-selected') === 'true' && document.activeElement?.textContent?.includes('Stage'));
  assert(focusedIsMoved, 'focus did not follow the moved stage');
  // Button: move it back to the front.
  await page.getByRole('button', { name: '◀ Move earlier' }).click();
  await page.getByRole('button', { name: '◀ Move earlier' }).click();
  names = await stageNames(page);
  assert(names[0] === newName, `Move earlier twice did not bring "${newName}" to the front: ${names.join(', ')}`);
  // Mouse: drag the first block onto the last.
  await stageBlocks(page).nth(0).dragTo(stageBlocks(page).nth(names.length - 1));
  const dragged = await stageNames(page);
  assert(dragged[dragged.length - 1] === newName, `dragging "${newName}" onto the last block did not move it there: ${dragged.join(', ')}`);
  await waitForResults(page);
  await shot('reordered');
}
