// Save the part's material and a stage's medium to "My library", find them in the pickers, after a reload too.
import { assert, openCleanWorkbench, stageBlocks, waitForResults } from '../lib/workbenchPage.mjs';

export const name = 'my library: save a material and a medium, pick them, keep them over a reload';

export async function run({ page, baseUrl, shot }) {
  await openCleanWorkbench(page, baseUrl);
  await stageBlocks(page).nth(1).click();
  await page.getByRole('link', { name: 'My library' }).click();
  const materialForm = page.getByRole('form', { name: /Save the part’s material/ });
  // Refused first: the description is empty.
  await materialForm.getByRole('button', { name: 'Save material to my library' }).click();
  assert(/description/.test(await materialForm.getByRole('alert').textContent()), 'an empty description was not refused by name');
  await materialForm.getByLabel('Name', { exact: true }).fill('Shop bar stock, our supplier');
  await materialForm.getByLabel('Id (letters, digits, hyphens)').fill('shop-bar-stock');
  await materialForm.getByLabel('Description').fill('Bar stock as delivered to our shop; tables copied from the demo plan.');
  await materialForm.getByRole('button', { name: 'Save material to my library' }).click();
  await materialForm.getByText(/Saved “Shop bar stock, our supplier”/).waitFor();

  const mediumForm = page.getByRole('form', { name: /Save the medium/ });
  await mediumForm.getByLabel('Name', { exact: true }).fill('Tank 2 water');
  await mediumForm.getByLabel('Id (letters, digits, hyphens)').fill('tank-2-water');
  await mediumForm.getByLabel('Description').fill('Our tank 2, unagitated; curve as typed in the demo plan.');
  await mediumForm.getByRole('button', { name: 'Save medium to my library' }).click();
  await mediumForm.getByText(/Saved “Tank 2 water”/).waitFor();
  await shot('library-saved');

  await page.reload();
  await page.getByRole('region', { name: 'Saved materials' }).getByText('Shop bar stock, our supplier').waitFor();
  await page.getByRole('region', { name: 'Saved media' }).getByText('Tank 2 water').waitFor();
  await page.getByRole('link', { name: 'Workbench' }).click();
  await waitForResults(page);
  const materialOptions = await page.getByLabel('From the library').first().locator('option').allTextContents();
  assert(materialOptions.includes('Shop bar stock, our supplier'), `saved material missing from the picker: ${materialOptions.join(', ')}`);
  await page.getByLabel('From the library').first().selectOption({ label: 'Shop bar stock, our supplier' });
  await waitForResults(page);
  await stageBlocks(page).nth(1).click();
  const mediumPicker = page.locator('#medium-pick');
  const mediumOptions = await mediumPicker.locator('option').allTextContents();
  assert(mediumOptions.includes('Tank 2 water'), `saved medium missing from the picker: ${mediumOptions.join(', ')}`);
}
