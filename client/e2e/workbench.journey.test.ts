import { BF180G } from '@channelwright/shared/device';
import { parseQuantity } from '@channelwright/shared/units';
import { readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import Papa from 'papaparse';
import { expect, it } from 'vitest';
import { DEMO_USERS } from './harness/demo-accounts';
import { describeJourney } from './harness/journey';
import { SCREENSHOT_DIR } from './harness/paths';
import { field, openSheet, PROJECT, quantityIn, resultCell, resultsSettled, SHEET, sheetCell, shoot } from './harness/sheet-pages';
import { signIn } from './harness/sign-in';

/** The device the first journey adds, shared with the export journey. */
const added: { name?: string; w?: number } = {};

describeJourney('sizing devices on a sheet', (journey) => {
  it('the demo designer adds a device to the amplifier sheet, sizes it by typing, saves it and finds the row', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.designer);
    await openSheet(page);
    await shoot(page, 'workbench-1-sheet');

    await page.getByRole('link', { name: 'Add device' }).click();
    await page.getByRole('group', { name: 'Sizing targets' }).waitFor();
    const name = await field(page, 'Name').inputValue();
    expect(name).toMatch(/^M\d+$/);
    await field(page, 'ID').fill('20 µA');
    await field(page, 'L').fill('0.5 µm');
    await field(page, 'VOV').fill('0.2 V');
    expect(await page.getByText('= 20 µA').count()).toBe(1);
    expect(await page.getByText('= 500 nm').count()).toBe(1);

    await resultsSettled(page, 'all-region · TT · 27 °C');
    const w = await quantityIn(resultCell(page, 'Geometry', 'W'), 'm');
    // Plausibility only (the engine's own tests check the width against published equations): the
    // all-region model with the bulk-charge factor 1/n puts 20 µA at VOV = 0.2 V, L = 0.5 µm near 2 µm.
    expect(w).toBeGreaterThan(1e-6);
    expect(w).toBeLessThan(3e-6);
    expect(await quantityIn(resultCell(page, 'Bias', 'VOV'), 'V')).toBeCloseTo(0.2, 3);
    // The warnings region answers either way: a list of cautions, or that there are none.
    await page.getByLabel('Warnings').first().waitFor();
    await shoot(page, 'workbench-2-new-device-sized');

    await page.getByRole('button', { name: 'Save to the sheet' }).click();
    await page.waitForURL((url) => /\/sheets\/[^/]+\/devices\/(?!new$)[^/]+$/.test(url.pathname));
    await page.getByRole('heading', { level: 1, name }).waitFor();

    await page.getByRole('navigation', { name: 'Breadcrumbs' }).getByRole('link', { name: SHEET }).click();
    const row = page.getByRole('table', { name: 'Devices' }).locator(`tr[data-device="${name}"]`);
    await row.waitFor();
    expect(await quantityIn(await sheetCell(page, name, 'W'), 'm')).toBeCloseTo(w, 10);
    expect((await (await sheetCell(page, name, 'ID')).textContent())?.trim()).toBe('20 µA');
    expect((await (await sheetCell(page, name, 'L')).textContent())?.trim()).toBe('500 nm');
    await row.scrollIntoViewIfNeeded();
    await shoot(page, 'workbench-3-sheet-with-new-row');
    Object.assign(added, { name, w });
    await page.close();
  });

  it('the designer checks a stored device against the square law by hand, takes a VOV from the W/L chart and saves the chart', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.designer);
    await openSheet(page);
    await page.getByRole('table', { name: 'Devices' }).getByRole('link', { name: 'M3', exact: true }).click();
    await page.getByRole('group', { name: 'Sizing targets' }).waitFor();
    expect(await field(page, 'VOV').inputValue()).toBe('150 mV');

    await page.getByText('Square law', { exact: true }).click();
    await resultsSettled(page, 'square-law · TT · 27 °C');
    // Shichman and Hodges (1968), saturation: W = 2·ID·L / (kp·VOV²·(1 + λ·VDS)). M3 of the invented
    // sheet: ID = 10 µA, L = 1 µm, VDS = 0.6 V, VOV = 0.15 V; invented BF180-G NMOS: kp = 290 µA/V²,
    // λ = 0.08 /V at lRef = 0.5 µm, so λ(1 µm) = 0.04 /V. By hand: 2.993 µm, then the 5 nm width grid.
    const { kp, lambda, wgrid } = BF180G.nmos;
    const lRef = BF180G.nmos.lRef as number;
    const byHand = (2 * 10e-6 * 1e-6) / (kp * 0.15 ** 2 * (1 + ((lambda * lRef) / 1e-6) * 0.6));
    const shown = await quantityIn(resultCell(page, 'Geometry', 'W'), 'm');
    expect(Math.abs(shown - byHand)).toBeLessThanOrEqual(wgrid);
    await shoot(page, 'workbench-4-square-law-check');

    await page.getByText('All-region', { exact: true }).click();
    await resultsSettled(page, 'all-region · TT · 27 °C');
    const chart = page.getByRole('figure', { name: 'W/L against VOV' });
    const plot = chart.locator('.recharts-cartesian-grid');
    await chart.locator('.recharts-line path').first().waitFor();
    await chart.scrollIntoViewIfNeeded();
    const box = await plot.boundingBox();
    if (!box) throw new Error('The W/L chart has no plot area');
    const before = await field(page, 'VOV').inputValue();
    await page.mouse.move(box.x + box.width * 0.75, box.y + box.height * 0.5);
    await chart.getByText('Click to take this VOV').waitFor();
    // A picture of the chart alone: a full-page one would scroll it away from under the pointer.
    await chart.screenshot({ path: join(SCREENSHOT_DIR, 'workbench-5-chart-hover.png') });
    await page.mouse.click(box.x + box.width * 0.75, box.y + box.height * 0.5);

    const vovField = await field(page, 'VOV').elementHandle();
    await page.waitForFunction(([input, old]) => (input as HTMLInputElement).value !== old, [vovField, before] as const);
    const picked = parseQuantity(await field(page, 'VOV').inputValue(), 'V');
    expect(picked.ok).toBe(true);
    // Three quarters across the axis of −150 mV … 600 mV is near 410 mV.
    expect(picked.ok && picked.value).toBeGreaterThan(0.3);
    expect(picked.ok && picked.value).toBeLessThan(0.5);
    await resultsSettled(page, 'all-region · TT · 27 °C');
    expect(await quantityIn(resultCell(page, 'Bias', 'VOV'), 'V')).toBeCloseTo(picked.ok ? picked.value : Number.NaN, 2);
    await shoot(page, 'workbench-6-vov-taken-from-chart');

    // The chart as files: a standalone SVG with its legend drawn in, and a PNG drawn from it.
    const [svgFile] = await Promise.all([page.waitForEvent('download'), chart.getByRole('button', { name: 'Download wOverL-vs-vov as SVG' }).click()]);
    expect(svgFile.suggestedFilename()).toBe('wOverL-vs-vov.svg');
    const svg = await readFile(await svgFile.path(), 'utf8');
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toContain('xmlns="http://www.w3.org/2000/svg"');
    expect(svg).toContain('TT, 27 °C');
    expect(svg).toContain('VOV (V)');
    const [pngFile] = await Promise.all([page.waitForEvent('download'), chart.getByRole('button', { name: 'Download wOverL-vs-vov as PNG' }).click()]);
    const png = await readFile(await pngFile.path());
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    await writeFile(join(SCREENSHOT_DIR, 'workbench-6b-chart-as-png.png'), png);
    await page.close();
  });

  it('the designer exports the sheet as CSV and the file holds the device added above, in plain SI', async () => {
    expect(added.name, 'the first journey adds the device this one looks for').toBeDefined();
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.designer);
    await openSheet(page);

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download CSV' }).click()]);
    expect(download.suggestedFilename()).toBe('Two-stage_amplifier.csv');
    const text = await readFile(await download.path(), 'utf8');
    // The metadata comes first as "# key: value" lines, then a plain table any CSV reader takes.
    const lines = text.split('\r\n');
    const metadata = Object.fromEntries(lines.filter((line) => line.startsWith('# ')).map((line) => /^# ([^:]+): (.*)$/.exec(line)?.slice(1) ?? []));
    const table = lines.filter((line) => !line.startsWith('#')).join('\r\n');
    expect(metadata).toMatchObject({ format: 'channelwright-sheet', project: PROJECT, sheet: SHEET, process: 'BF180-G' });
    const rows = Papa.parse<Record<string, string>>(table.trim(), { header: true }).data;
    const row = rows.find((r) => r.Name === added.name);
    expect(row, `a row for ${added.name}`).toBeDefined();
    expect(Number(row?.['ID (A)']) / 20e-6).toBeCloseTo(1, 9);
    expect(Number(row?.['L (m)'])).toBe(0.5e-6);
    expect(row?.Constraint).toBe('vov');
    // The page shows four significant digits of the same stored number.
    expect(Number(row?.['W (m)']) / (added.w as number)).toBeCloseTo(1, 3);
    expect(Number(row?.['VOV (V)'])).toBeCloseTo(0.2, 3);
    await shoot(page, 'workbench-7-exported');
    await page.close();
  });

  it('a viewer reads the sheet and downloads it, with no way to edit', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.viewer);
    await openSheet(page);
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download CSV' }).click()]);
    expect(await readFile(await download.path(), 'utf8')).toContain('\r\nM1,input pair (+),pmos,');
    expect(await page.getByRole('link', { name: 'Add device' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Actions for / }).count()).toBe(0);

    await page.getByRole('table', { name: 'Devices' }).getByRole('link', { name: 'M1', exact: true }).click();
    await page.getByText('read only', { exact: true }).waitFor();
    expect(await field(page, 'ID').isDisabled()).toBe(true);
    expect(await page.getByRole('button', { name: 'Save', exact: true }).count()).toBe(0);
    await shoot(page, 'workbench-8-viewer-device');
    await page.close();
  });
});
