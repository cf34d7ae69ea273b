import { join } from 'node:path';
import { expect, it } from 'vitest';
import { DEMO_USERS } from './harness/demo-accounts';
import { describeJourney } from './harness/journey';
import { REPO_ROOT } from './harness/paths';
import { saveScreenshot } from './harness/screenshots';
import { signIn } from './harness/sign-in';

// Invented demo data, not any foundry's process: the server's import fixture (BF160-G of the invented Brackenfold).
const PROFILE_CSV = join(REPO_ROOT, 'server/test/fixtures/processes/good-process.csv');

describeJourney('the process library', (journey) => {
  let profilePath = '';

  it('an admin imports a profile CSV, edits one parameter, and sees the new version and the diff', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.admin);
    await page.getByRole('navigation').getByRole('link', { name: 'Processes' }).click();
    await page.getByRole('table', { name: 'Process profiles' }).getByText('BF180-G').waitFor();
    await saveScreenshot(page, 'processes-library');

    await page.getByRole('button', { name: 'Import' }).click();
    const imported = page.waitForResponse((r) => r.url().endsWith('/api/processes/import'));
    await page.getByLabel('Choose a process file').setInputFiles(PROFILE_CSV);
    expect((await imported).status()).toBe(201);
    await page.getByRole('heading', { level: 1, name: 'BF160-G' }).waitFor();
    profilePath = new URL(page.url()).pathname;
    expect(profilePath).toMatch(/^\/processes\/[0-9a-f-]{36}$/);
    const kpRow = page.getByRole('table', { name: 'Device parameters' }).getByRole('row', { name: /KP/ });
    expect(await kpRow.getByRole('cell').allTextContents()).toEqual(['310 µA/V²', '70 µA/V²']);
    await saveScreenshot(page, 'processes-imported');

    await page.getByRole('link', { name: 'Edit' }).click();
    const editor = page.getByRole('form', { name: 'Process profile editor' });
    const kp = editor.getByRole('group', { name: 'NMOS' }).getByLabel(/^KP \(kp\)/);
    await kp.fill('325u');
    await editor.getByText('= 325 µA/V²').waitFor();
    await editor.getByLabel('What changed').fill('kp from the second lot');
    await saveScreenshot(page, 'processes-editor');
    const saved = page.waitForResponse((r) => r.request().method() === 'PUT' && r.url().includes('/api/processes/'));
    await editor.getByRole('button', { name: 'Save as version 2' }).click();
    expect((await saved).status()).toBe(200);

    await page.waitForURL((url) => url.pathname === profilePath);
    const history = page.getByRole('table', { name: 'Version history' });
    await history.getByText('kp from the second lot').waitFor();
    expect(await history.getByRole('row').count()).toBe(3); // header, v2, v1
    const diff = page.getByRole('table', { name: 'Changes from v1 to v2' });
    const change = diff.getByRole('row', { name: /nmos\.kp/ });
    await change.waitFor();
    expect(await change.getByRole('cell').allTextContents()).toEqual(['nmos.kp', '310 µA/V²', '325 µA/V²', 'changed']);
    expect(await diff.getByRole('row').count()).toBe(2); // header and the one change
    await saveScreenshot(page, 'processes-new-version-diff');
    await page.close();
  });

  it('a designer sees the profile but has no edit button, and the server refuses their edit', async () => {
    expect(profilePath).not.toBe('');
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.designer);
    await page.goto('/processes');
    await page.getByRole('table', { name: 'Process profiles' }).getByRole('link', { name: 'BF160-G' }).click();
    await page.getByRole('heading', { level: 1, name: 'BF160-G' }).waitFor();
    await page.getByRole('table', { name: 'Device parameters' }).waitFor();
    expect(await page.getByRole('button', { name: 'Export v2' }).count()).toBe(1);
    expect(await page.getByRole('link', { name: 'Edit' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'More actions' }).count()).toBe(0);
    await saveScreenshot(page, 'processes-designer-view');

    // The same edit the admin could make, sent with the designer's own session from the page.
    const id = profilePath.split('/').at(-1)!;
    const answer = await page.evaluate(async (profileId) => {
      const token = window.localStorage.getItem('channelwright.accessToken');
      const headers = { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' };
      const current = await (await fetch(`/api/processes/${profileId}`, { headers })).json();
      const definition = { ...current.version.definition, vdd: 1.6 };
      const response = await fetch(`/api/processes/${profileId}`, { method: 'PUT', headers, body: JSON.stringify({ baseVersion: current.latestVersion, definition }) });
      return { status: response.status, body: await response.json(), latest: current.latestVersion };
    }, id);
    expect(answer.status).toBe(403);
    expect(answer.body).toMatchObject({ statusCode: 403, code: 'NOT_PROCESS_MAINTAINER' });

    await page.goto(`/processes/${id}/edit`);
    await page.getByRole('heading', { name: 'Nothing at this address' }).waitFor();
    await page.goto(profilePath);
    await page.getByRole('table', { name: 'Version history' }).getByText('kp from the second lot').waitFor();
    expect(await page.getByRole('table', { name: 'Version history' }).getByRole('row').count()).toBe(3);
    await page.close();
  });
});
