import { expect, it } from 'vitest';
import { DEMO_USERS } from './harness/demo-accounts';
import { describeJourney } from './harness/journey';
import { saveScreenshot } from './harness/screenshots';
import { signIn } from './harness/sign-in';

describeJourney('administering users', (journey) => {
  it('the admin opens the users page from the navbar and sees every demo account', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.admin);

    await page.getByRole('navigation').getByRole('link', { name: 'Users' }).click();
    await page.getByRole('heading', { level: 1, name: 'Users' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/admin/users');

    const table = page.getByRole('table', { name: 'Users' });
    await table.getByText(DEMO_USERS.viewer, { exact: true }).waitFor();
    for (const email of Object.values(DEMO_USERS)) {
      expect(await table.getByText(email, { exact: true }).count()).toBe(1);
    }
    await saveScreenshot(page, 'admin-users');
    await page.close();
  });

  it('the admin makes the reviewer a process maintainer, and the change survives a reload', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.admin);
    await page.goto('/admin/users');
    const table = page.getByRole('table', { name: 'Users' });
    await table.getByText(DEMO_USERS.reviewer, { exact: true }).waitFor();

    const reviewerRow = table.getByRole('row').filter({ hasText: DEMO_USERS.reviewer });
    const maintainer = reviewerRow.getByRole('switch', { name: /maintains process profiles/ });
    const before = await maintainer.isChecked();
    const saved = page.waitForResponse((r) => r.request().method() === 'PATCH' && r.url().includes('/api/users/'));
    await maintainer.setChecked(!before);
    expect((await saved).status()).toBe(200);

    await page.reload();
    await table.getByText(DEMO_USERS.reviewer, { exact: true }).waitFor();
    expect(await maintainer.isChecked()).toBe(!before);
    await page.close();
  });

  it('a designer who types the users address is shown the not-found page', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.designer);
    await page.goto('/admin/users');
    await page.getByRole('heading', { name: 'Nothing at this address' }).waitFor();
    expect(await page.getByRole('table', { name: 'Users' }).count()).toBe(0);
    await page.close();
  });
});
