import type { Page } from 'playwright-core';
import { DEMO_PASSWORD } from './demo-accounts';

/** Signs in through the real form and waits until the signed-in shell shows. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  const form = page.getByRole('form', { name: 'Sign in' });
  await form.getByLabel(/^E-mail/).fill(email);
  await form.getByLabel(/^Password/).fill(password);
  await form.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('note', { name: 'Caution' }).waitFor();
}

/** Signs out through the account menu and waits for the sign-in form. */
export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^Account menu for / }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.getByRole('form', { name: 'Sign in' }).waitFor();
}
