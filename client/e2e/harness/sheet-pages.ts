import { parseQuantity } from '@channelwright/shared/units';
import type { Locator, Page } from 'playwright-core';
import { saveScreenshot } from './screenshots';

// The invented demo data the server seeds: the Wrenmoss project and its two-stage amplifier sheet.
export const PROJECT = 'Wrenmoss sensor front end';
export const SHEET = 'Two-stage amplifier';

/** Full-page pictures start at the top, so the fixed header stays where it belongs. */
export async function shoot(page: Page, name: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await saveScreenshot(page, name);
}

/** A quantity as the page writes it, read back in SI ("16.09 µm" → 1.609e-5). */
export function quantityOf(text: string, unit: string): number {
  const parsed = parseQuantity(text.trim(), unit);
  if (!parsed.ok) throw new Error(`"${text}" is not a quantity in ${unit}: ${parsed.reason}`);
  return parsed.value;
}

/** The number a cell shows, read back in SI. */
export async function quantityIn(cell: Locator, unit: string): Promise<number> {
  return quantityOf((await cell.textContent()) ?? '', unit);
}

/** The value cell of a row of a results group of a device page, e.g. ("Geometry", "W"). */
export const resultCell = (page: Page, group: string, symbol: string) =>
  page
    .getByRole('table', { name: group })
    .getByRole('row')
    .filter({ has: page.getByRole('rowheader', { name: symbol, exact: true }) })
    .getByRole('cell');

/** The cell of one device row of the sheet table under a column title. */
export async function sheetCell(page: Page, device: string, column: string): Promise<Locator> {
  const table = page.getByRole('table', { name: 'Devices' });
  const titles = (await table.getByRole('columnheader').allTextContents()).map((t) => t.trim());
  const index = titles.indexOf(column);
  if (index < 0) throw new Error(`No column ${column} among ${titles.join(', ')}`);
  return table.locator(`tr[data-device="${device}"]`).getByRole('cell').nth(index);
}

export const field = (page: Page, name: string) => page.getByRole('textbox', { name, exact: true });

/** Waits until the results answer the targets on screen (no request on its way). */
export async function resultsSettled(page: Page, modelBadge: string): Promise<void> {
  const results = page.getByRole('region', { name: 'Results' });
  await results.getByText(modelBadge).waitFor();
  await results.getByRole('status', { name: 'Updating results' }).waitFor({ state: 'detached' });
}

/** From the home page to the demo amplifier sheet, waiting until the page has settled. */
export async function openSheet(page: Page): Promise<void> {
  await page.getByRole('table', { name: 'Projects' }).getByRole('link', { name: PROJECT }).click();
  await page.getByRole('heading', { level: 1, name: PROJECT }).waitFor();
  await page.getByRole('table', { name: 'Sheets' }).getByRole('link', { name: SHEET }).click();
  await page.getByRole('table', { name: 'Devices' }).waitFor();
  // Panels that load after the table move it down; click rows only once the page has settled.
  await page.waitForLoadState('networkidle');
}
