import { parseQuantity } from '@channelwright/shared/units';
import type { Locator, Page } from 'playwright-core';
import { expect, it } from 'vitest';
import { DEMO_USERS } from './harness/demo-accounts';
import { describeJourney } from './harness/journey';
import { saveScreenshot } from './harness/screenshots';
import { signIn } from './harness/sign-in';

/**
 * The journeys' server runs with NODE_ENV=test, which leaves DEMO_CHARACTERISATION off (the default grid of the
 * invented BF180-G is 3.5 million points, one to three minutes of ngspice here). So the admin characterises the NMOS
 * on a small grid of the same card: 3 lengths × 181 VGS × 2 VDS × 2 VSB at TT and 27 °C, 2,172 points, a few seconds.
 * The client starts only the default grid; this small one goes through the same API the panel uses.
 */
const SMALL_GRID = { lengths: [0.18e-6, 0.5e-6, 1e-6], vds: [0.6, 1.2], vsb: [0, 0.45], corners: ['TT'], temperatures: [27] };
/** Bounded wait for the characterisation (and the page's progress polling) to reach done. */
const CHARACTERISED_WITHIN_MS = 90_000;

async function quantityIn(cell: Locator, unit: string): Promise<number> {
  const text = (await cell.textContent())?.trim() ?? '';
  const parsed = parseQuantity(text, unit);
  if (!parsed.ok) throw new Error(`"${text}" is not a quantity in ${unit}: ${parsed.reason}`);
  return parsed.value;
}

/** Calls the API as the user signed in on this page, as the client does. */
function apiAsPage(page: Page, path: string, init: { method: string; body?: unknown }): Promise<{ status: number; body: { id?: string; processId?: string } }> {
  return page.evaluate(
    async ({ path, init }) => {
      const token = window.localStorage.getItem('channelwright.accessToken');
      const response = await fetch(`/api${path}`, {
        method: init.method,
        headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
        body: init.body === undefined ? undefined : JSON.stringify(init.body),
      });
      return { status: response.status, body: await response.json() };
    },
    { path, init },
  );
}

describeJourney('characterisation and the table model', (journey) => {
  /** The gm/ID chart's reading for L = 500 nm at gm/ID 15, to compare the sized width with. */
  const read = { idW: 0, vds: '' };

  it('the admin characterises BF180-G, follows it to done, and reads the gm/ID design charts', { timeout: 150_000 }, async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.admin);
    await page.getByRole('navigation').getByRole('link', { name: 'Processes' }).click();
    await page.getByRole('table', { name: 'Process profiles' }).getByRole('link', { name: 'BF180-G' }).click();
    const card = page.getByRole('region', { name: 'Model card' });
    await card.getByRole('table', { name: 'Card models and devices' }).getByRole('row', { name: /bfn18 / }).waitFor();
    expect(await card.getByRole('table', { name: 'Corners and card sections' }).getByRole('row', { name: /^TT/ }).textContent()).toBe('TT.lib tt');

    const panel = page.getByRole('region', { name: 'Characterisation' });
    await panel.getByText('This version has not been characterised yet.').waitFor();
    await panel.getByRole('button', { name: 'Characterise…' }).click();
    await panel.getByRole('table', { name: 'Default grid' }).waitFor();
    await saveScreenshot(page, 'characterisation-1-default-grid');

    const processId = new URL(page.url()).pathname.split('/').at(-1) as string;
    const started = await apiAsPage(page, '/characterisations', { method: 'POST', body: { processId, devices: [{ polarity: 'nmos' }], grid: SMALL_GRID } });
    expect(started.status).toBe(202);
    await page.reload();
    await panel.getByRole('progressbar', { name: 'Characterisation progress' }).waitFor();
    await saveScreenshot(page, 'characterisation-2-progress');
    await panel.getByLabel('Characterisation status').getByText('done', { exact: true }).waitFor({ timeout: CHARACTERISED_WITHIN_MS });
    expect(await panel.getByLabel('Points simulated').textContent()).toBe('2,172 of 2,172 points (100 %)');
    const table = panel.getByRole('table', { name: 'Characterised tables' });
    await table.waitFor();
    expect(await table.getByRole('row').nth(1).getByRole('cell').last().textContent()).toBe('in use');
    await saveScreenshot(page, 'characterisation-3-done');

    await panel.getByRole('link', { name: 'Open the gm/ID design charts' }).click();
    const idW = page.getByRole('figure', { name: 'Current density ID/W against gm/ID' });
    await idW.locator('.recharts-line').first().waitFor();
    // The axes name their quantities with units.
    await idW.getByText('gm/ID (1/V)').waitFor();
    await idW.getByText('ID/W (A/m)').waitFor();
    await page.getByRole('figure', { name: 'Transit frequency fT against gm/ID' }).getByText('fT (Hz)').waitFor();
    const readout = page.getByRole('table', { name: 'Figures at the chosen gm/ID' });
    const rows = readout.getByRole('row');
    expect(await rows.count()).toBe(4); // header and the three lengths
    const at500 = rows.filter({ hasText: 'L = 500 nm' }).getByRole('cell');
    read.idW = await quantityIn(at500.nth(2), 'A/m');
    read.vds = (await page.getByRole('combobox', { name: 'VDS' }).inputValue()).trim();
    // Plausibility only (the server's tests check the tables against ngspice): at gm/ID = 15 S/A a 180 nm-class NMOS
    // carries a few µA per µm (common practice, no source), and its intrinsic gain grows with L.
    expect(read.idW).toBeGreaterThan(0.5);
    expect(read.idW).toBeLessThan(20);
    const gains = await Promise.all(['L = 180 nm', 'L = 500 nm', 'L = 1 µm'].map((l) => quantityIn(rows.filter({ hasText: l }).getByRole('cell').nth(3), '')));
    expect(gains[1]).toBeGreaterThan(gains[0]);
    expect(gains[2]).toBeGreaterThan(gains[1]);
    await saveScreenshot(page, 'characterisation-4-design-charts');
    await page.close();
  });

  it('a designer sizes a device on the table model and sees its basis and table', { timeout: 60_000 }, async () => {
    expect(read.idW).toBeGreaterThan(0);
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.designer);
    await page.getByRole('navigation').getByRole('link', { name: 'Size a device' }).click();
    await page.getByRole('group', { name: 'Sizing targets' }).waitFor();
    await page.getByRole('combobox', { name: 'Process' }).click();
    await page.getByRole('option', { name: /^BF180-G/ }).click();
    await page.getByText('Tables', { exact: true }).click();
    const field = (name: string) => page.getByRole('textbox', { name, exact: true });
    await field('ID').fill('20 µA');
    await field('L').fill('0.5 µm');
    await field('VDS').fill(read.vds);
    await page.getByText('gm/ID', { exact: true }).click();
    await field('gm/ID').fill('15');

    const results = page.getByRole('region', { name: 'Results' });
    await results.getByText('table · TT · 27 °C').waitFor();
    await results.getByRole('status', { name: 'Updating results' }).waitFor({ state: 'detached' });
    const note = results.getByRole('note', { name: 'Model and accuracy' });
    expect(await note.getByLabel('Accuracy basis').textContent()).toBe('basis: table');
    await note.getByText('Tables from the model card').waitFor();
    await note.getByText(/^bfn18 · table [0-9a-f]{12}$/).waitFor();
    // W = ID / (ID/W) at that gm/ID and L (the gm/ID method); the table model adds the card's small width
    // reduction per finger and snaps to the width grid, so the two agree to a few per cent.
    const w = await quantityIn(results.getByLabel('W', { exact: true }).first(), 'm');
    expect(w / (20e-6 / read.idW)).toBeGreaterThan(0.97);
    expect(w / (20e-6 / read.idW)).toBeLessThan(1.03);
    await saveScreenshot(page, 'characterisation-5-table-sized');
    await page.close();
  });
});
