import { expect, it } from 'vitest';
import { DEMO_USERS } from './harness/demo-accounts';
import { describeJourney } from './harness/journey';
import { saveScreenshot } from './harness/screenshots';
import { signIn, signOut } from './harness/sign-in';

describeJourney('signing in and out', (journey) => {
  it('the demo designer signs in, is greeted on the home page, signs out and is back on sign-in', async () => {
    const page = await journey.newPage();
    await page.goto('/');
    await page.getByRole('form', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await saveScreenshot(page, 'sign-in');

    await signIn(page, DEMO_USERS.designer);

    const greeting = page.getByRole('heading', { level: 1, name: /^Welcome, / });
    await greeting.waitFor();
    expect(new URL(page.url()).pathname).toBe('/');
    expect(await page.getByRole('heading', { name: 'Your projects' }).isVisible()).toBe(true);
    expect(await page.getByRole('note', { name: 'Caution' }).textContent()).toContain('first-order estimates');
    expect(await page.getByRole('navigation').getByRole('link', { name: 'Users' }).count()).toBe(0);
    await saveScreenshot(page, 'home-designer');

    await page.getByRole('button', { name: /^Account menu for / }).click();
    await page.getByRole('menuitem', { name: 'Use the dark scheme' }).click();
    await page.locator('html[data-mantine-color-scheme="dark"]').waitFor({ state: 'attached' });
    await saveScreenshot(page, 'home-designer-dark');

    await signOut(page);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    expect(await page.evaluate(() => window.localStorage.getItem('channelwright.accessToken'))).toBeNull();

    // Signed out means signed out: the home page now sends the visitor back to sign-in.
    await page.goto('/');
    await page.getByRole('form', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await page.close();
  });

  it('a wrong password is refused on the form itself', async () => {
    const page = await journey.newPage();
    await page.goto('/sign-in');
    const form = page.getByRole('form', { name: 'Sign in' });
    await form.getByLabel(/^E-mail/).fill(DEMO_USERS.designer);
    await form.getByLabel(/^Password/).fill('certainly-not-the-password');
    await form.getByRole('button', { name: 'Sign in' }).click();

    const alert = form.getByRole('alert');
    await alert.waitFor();
    expect(await alert.textContent()).toContain('Sign-in failed');
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await form.locator('button[type="submit"]:not([data-loading])').waitFor();
    await saveScreenshot(page, 'sign-in-refused');
    await page.close();
  });
});
