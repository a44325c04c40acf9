// Switch units without changing the plan; every control of the first screen is reachable by Tab.
import { assert, openCleanWorkbench, waitForInput, waitForInputValue, waitForResults } from '../lib/workbenchPage.mjs';

export const name = 'unit switch keeps the plan; controls have names';

export async function run({ page, baseUrl, shot }) {
  await openCleanWorkbench(page, baseUrl);
  const diameterMm = Number(await page.getByLabel('Diameter (mm)').inputValue());
  await page.getByRole('radio', { name: 'US' }).check();
  // 1 in = 25.4 mm exactly (NIST SP 811, 2008 ed., Appendix B.8, from memory); the field shows 6 significant digits.
  await waitForInput(page.getByLabel('Diameter (in)'), (v) => Math.abs(Number(v) * 25.4 - diameterMm) < 1e-3, `diameter ${diameterMm} mm not shown in inches`);
  await page.getByRole('radio', { name: 'SI' }).check();
  await waitForInputValue(page.getByLabel('Diameter (mm)'), String(diameterMm), 'switching units back changed the diameter');
  assert(!(await page.getByRole('button', { name: '↶ Undo' }).isEnabled()), 'a unit switch must not be an edit of the plan');
  await waitForResults(page);
  // Every input, select, textarea and button has an accessible name.
  const unnamed = await page.evaluate(() =>
    [...document.querySelectorAll('input, select, textarea, button')]
      .filter((el) => !el.closest('.plotly-chart'))
      .filter((el) => {
        const id = el.id;
        const byLabel = id && document.querySelector(`label[for="${CSS.escape(id)}"]`);
        const wrapped = el.closest('label');
        return !(el.getAttribute('aria-label') || byLabel || wrapped || (el.tagName === 'BUTTON' && el.textContent.trim()));
      })
      .map((el) => el.outerHTML.slice(0, 80)),
  );
  assert(unnamed.length === 0, `controls without a name:\n${unnamed.join('\n')}`);
  await shot('si-again');
}
