import { join } from 'node:path';
import { expect, it } from 'vitest';
import { DEMO_USERS } from './harness/demo-accounts';
import { describeJourney } from './harness/journey';
import { REPO_ROOT } from './harness/paths';
import { saveScreenshot } from './harness/screenshots';
import { signIn } from './harness/sign-in';

// Invented test curves (not measured on any device): simulated by Debian ngspice 39 with MOS level 1 and known
// parameters (VTO 0.6 V, KP 120 µA/V², GAMMA 0.5 √V, PHI 0.75 V, LAMBDA 0.04 1/V), as the file's header says.
const CURVES = join(REPO_ROOT, 'client/e2e/fixtures/level1-nmos-curves.csv');

describeJourney('fitting parameters to curves', (journey) => {
  it('an admin uploads curves, follows the fit, sees the parameters and the charts, and saves a new version', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.admin);
    await page.getByRole('navigation').getByRole('link', { name: 'Fit parameters' }).click();
    const form = page.getByRole('form', { name: 'Curves to fit' });
    await form.getByLabel('Choose a curve file').setInputFiles(CURVES);
    await form.getByText('level1-nmos-curves.csv').waitFor();
    await form.getByRole('combobox', { name: /Base profile/ }).click();
    await page.getByRole('option', { name: 'BF180-G' }).click();
    await form.getByText('Square law').click();
    await form.getByLabel(/^W \(/).fill('10u');
    await form.getByLabel(/^L \(/).fill('2u');
    await form.getByText('= 2 µm').waitFor();
    await saveScreenshot(page, 'extraction-upload');
    const created = page.waitForResponse((r) => r.request().method() === 'POST' && r.url().endsWith('/api/extractions'));
    await form.getByRole('button', { name: 'Upload and fit' }).click();
    expect((await created).status()).toBe(202);
    await page.waitForURL(/\/extractions\/[0-9a-f-]{36}$/);

    // A fit on a worker thread below the server's priority: on a busy machine it takes a while.
    const parameters = page.getByRole('table', { name: 'Fitted parameters' });
    await parameters.waitFor({ timeout: 45_000 });
    // Level 1's VTO is 0.6 V: recovered within 5 mV shows as 595 … 605 mV.
    const vt0 = await parameters.getByRole('row', { name: /VT0/ }).getByRole('cell').nth(1).textContent();
    expect(vt0).toMatch(/^(59[5-9]|60[0-5])(\.\d+)? mV$/);
    const kp = await parameters.getByRole('row', { name: /KP/ }).getByRole('cell').nth(1).textContent();
    expect(kp).toMatch(/^1(19|20|21)(\.\d+)? µA\/V²$/);
    await page.getByRole('figure', { name: 'ID against VGS, log axis' }).locator('.recharts-line path').first().waitFor();
    expect(await page.getByRole('figure', { name: 'ID against VGS, linear axis' }).locator('.recharts-scatter-symbol').count()).toBeGreaterThan(10);
    expect(await page.getByRole('figure', { name: 'Residuals of the fit' }).locator('.recharts-scatter-symbol').count()).toBeGreaterThan(10);
    await saveScreenshot(page, 'extraction-fit');

    await page.getByRole('textbox', { name: 'What the version changes' }).fill('Fitted to the level 1 test curves');
    const saved = page.waitForResponse((r) => r.request().method() === 'POST' && r.url().endsWith('/save'));
    await page.getByRole('button', { name: 'Save as BF180-G version 2' }).click();
    expect((await saved).status()).toBe(201);
    await page.getByRole('link', { name: 'BF180-G version 2' }).click();
    await page.getByRole('heading', { level: 1, name: 'BF180-G' }).waitFor();
    await page.getByRole('table', { name: 'Version history' }).getByText(/Fitted to the level 1 test curves/).waitFor();
    await saveScreenshot(page, 'extraction-saved-version');
    await page.close();
  });
});
