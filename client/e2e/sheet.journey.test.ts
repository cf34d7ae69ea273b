import { BF180G } from '@channelwright/shared/device';
import { readFile } from 'node:fs/promises';
import type { Locator, Page } from 'playwright-core';
import { expect, it } from 'vitest';
import { DEMO_USERS } from './harness/demo-accounts';
import { describeJourney } from './harness/journey';
import { openSheet, quantityIn, quantityOf, resultCell, sheetCell, shoot } from './harness/sheet-pages';
import { signIn } from './harness/sign-in';

const matrix = (page: Page) => page.getByRole('table', { name: 'Corner matrix' });
const matrixRow = (page: Page, device: string) => matrix(page).locator(`tr[data-device="${device}"]`);

/** A cell of the matrix by its device and column ("M3", "TT, 27 °C"): its value, read from its label. */
async function cellValue(cell: Locator, unit: string): Promise<number> {
  const label = (await cell.getAttribute('aria-label')) ?? '';
  const value = /: ([^,]+)/.exec(label)?.[1];
  if (!value) throw new Error(`The cell "${label}" has no value`);
  return quantityOf(value, unit);
}

/** Chooses the figure the matrix shows (a Mantine select: the box, then the option). */
async function showFigure(page: Page, label: string): Promise<void> {
  await page.getByRole('combobox', { name: 'Figure in the cells' }).click();
  await page.getByRole('option', { name: label, exact: true }).click();
  // The figure is read from the one answer already there: no request, the cells change at once.
  await page.getByRole('combobox', { name: 'Figure in the cells' }).and(page.locator(`[value="${label}"]`)).waitFor();
}

describeJourney('the sheet as a whole', (journey) => {
  it('the designer reads the corner matrix of the amplifier sheet: the worst cell of each row is marked, and TT at 27 °C is the device as sized', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.designer);
    await openSheet(page);

    // The device as it is stored: its VGS and W on its own page (all-region model, TT, 27 °C).
    await page.getByRole('table', { name: 'Devices' }).getByRole('link', { name: 'M3', exact: true }).click();
    await page.getByRole('group', { name: 'Sizing targets' }).waitFor();
    const vgs = await quantityIn(resultCell(page, 'Bias', 'VGS'), 'V');
    const w = await quantityIn(resultCell(page, 'Geometry', 'W'), 'm');
    await page.goBack();

    await page.getByRole('tab', { name: 'Corner matrix' }).click();
    await matrix(page).waitFor();
    const rows = await matrix(page).locator('tbody tr').count();
    expect(rows).toBe(9);

    // Default figure VDS − VDSsat: every row marks exactly one worst cell, the least headroom of the row, and names it.
    for (const name of ['M1', 'M3', 'M6', 'M9']) {
      const row = matrixRow(page, name);
      const cells = row.locator('td[data-status]');
      const values = await Promise.all((await cells.all()).map((cell) => cellValue(cell, 'V')));
      const worst = row.locator('td[data-worst]');
      expect(await worst.count(), `one worst cell in the row of ${name}`).toBe(1);
      expect(await cellValue(worst, 'V')).toBe(Math.min(...values));
      const where = /at ([^:]+):/.exec((await worst.getAttribute('aria-label')) ?? '')?.[1];
      expect(await row.getByRole('cell', { name: `Worst cell of ${name}` }).textContent()).toBe(where);
    }
    await shoot(page, 'sheet-1-corner-matrix-headroom');

    // The TT, 27 °C cell of M3 (W and L fixed, ID held) is the stored device: its VGS, and the VOV it was sized for.
    await showFigure(page, 'VGS');
    const tt27 = matrixRow(page, 'M3').locator('[aria-label^="M3 at TT, 27 °C:"]');
    expect(Math.abs((await cellValue(tt27, 'V')) - vgs)).toBeLessThan(1e-3);
    await showFigure(page, 'VOV');
    expect(await cellValue(matrixRow(page, 'M3').locator('[aria-label^="M3 at TT, 27 °C:"]'), 'V')).toBeCloseTo(0.15, 3);
    // The slow corner needs more gate drive for the same current than the fast one, at the same temperature.
    await showFigure(page, 'VGS');
    const ss = await cellValue(matrixRow(page, 'M3').locator('[aria-label^="M3 at SS, 27 °C:"]'), 'V');
    const ff = await cellValue(matrixRow(page, 'M3').locator('[aria-label^="M3 at FF, 27 °C:"]'), 'V');
    expect(ss).toBeGreaterThan(ff);
    await shoot(page, 'sheet-2-corner-matrix-vgs');

    // SPICE lines: one instance per device, M3 with the W on its page and the L it was sized at.
    await page.getByRole('button', { name: 'More export formats' }).click();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('menuitem', { name: 'SPICE instance lines' }).click()]);
    expect(download.suggestedFilename()).toBe('Two-stage_amplifier.sp');
    const deck = (await readFile(await download.path(), 'utf8')).split('\n');
    expect(deck[0]).toMatch(/^\* Channelwright sheet "Two-stage amplifier"/);
    const instances = deck.filter((line) => /^M/.test(line));
    expect(instances.map((line) => line.split(' ')[0])).toEqual(['M1', 'M2', 'M3', 'M4', 'M5', 'M6', 'M7', 'M8', 'M9']);
    const m3 = instances.find((line) => line.startsWith('M3 '))?.split(' ') ?? [];
    expect(m3.slice(1, 5)).toEqual(['d_M3', 'g_M3', 's_M3', 'b_M3']);
    const spiceW = Number(m3.find((f) => f.startsWith('W='))?.slice(2));
    // The page shows four significant digits of the same stored width.
    expect(spiceW / w).toBeCloseTo(1, 3);
    expect(Number(m3.find((f) => f.startsWith('L='))?.slice(2))).toBe(1e-6);
    await page.close();
  });

  it('the designer imports a small CSV: the preview names the bad row and its column, and only the good row is added, sized as by hand', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.designer);
    await openSheet(page);

    await page.getByRole('button', { name: 'Import CSV' }).click();
    const dialog = page.getByRole('dialog', { name: 'Import devices from a CSV' });
    await dialog.waitFor();
    // Units in the header, SI prefixes in the cells; the second row's ID does not read.
    const csv = ['Name,Polarity,Constraint,Target VOV (V),L (m),ID (A),VDS (V),Model', 'MIMP,nmos,vov,150m,1u,10u,0.6,square-law', 'MBAD,nmos,vov,150m,1u,ten micro,0.6,square-law', ''].join('\r\n');
    await dialog.locator('input[type="file"]').setInputFiles({ name: 'two-devices.csv', mimeType: 'text/csv', buffer: Buffer.from(csv, 'utf8') });

    await dialog.getByText('1 new', { exact: true }).waitFor();
    expect(await dialog.getByText('1 in error', { exact: true }).count()).toBe(1);
    const problem = dialog.getByRole('table', { name: 'Rows in error' }).getByRole('row').nth(1);
    const [row, column] = await problem.getByRole('cell').allTextContents();
    expect(row).toBe('3');
    expect(column).toMatch(/^ID/);
    expect(await dialog.getByRole('button', { name: 'Apply', exact: true }).isDisabled()).toBe(true);
    await shoot(page, 'sheet-3-import-preview');

    await dialog.getByRole('button', { name: 'Apply the good row only' }).click();
    await dialog.waitFor({ state: 'detached' });
    const added = page.getByRole('table', { name: 'Devices' }).locator('tr[data-device="MIMP"]');
    await added.waitFor();
    expect(await page.getByRole('table', { name: 'Devices' }).locator('tr[data-device="MBAD"]').count()).toBe(0);
    // Shichman and Hodges (1968), saturation: W = 2·ID·L / (kp·VOV²·(1 + λ·VDS)), on the invented BF180-G NMOS
    // (kp = 290 µA/V², λ = 0.08 /V at lRef = 0.5 µm, so 0.04 /V at 1 µm); the engine then snaps W to the 5 nm grid.
    const { kp, lambda, wgrid } = BF180G.nmos;
    const lRef = BF180G.nmos.lRef as number;
    const byHand = (2 * 10e-6 * 1e-6) / (kp * 0.15 ** 2 * (1 + ((lambda * lRef) / 1e-6) * 0.6));
    const shown = await quantityIn(await sheetCell(page, 'MIMP', 'W'), 'm');
    // Four significant digits on the sheet, one grid step from the engine's snapping.
    expect(Math.abs(shown - byHand)).toBeLessThanOrEqual(wgrid + byHand * 5e-4);
    await added.scrollIntoViewIfNeeded();
    await shoot(page, 'sheet-4-imported-row');
    await page.close();
  });
});
