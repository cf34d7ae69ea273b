import type { Page } from 'playwright-core';
import { expect, it } from 'vitest';
import { DEMO_USERS } from './harness/demo-accounts';
import { describeJourney } from './harness/journey';
import { saveScreenshot } from './harness/screenshots';
import { signIn, signOut } from './harness/sign-in';

const PROJECT = 'Wrenmoss sensor front end';
const SHEET = 'Two-stage amplifier';
const REVIEWER_NAME = 'Brackenfold Reviewer';

/** From the dashboard through the project to the amplifier sheet, as a person clicks. */
async function openAmplifier(page: Page): Promise<void> {
  await page.goto('/');
  await page.getByRole('link', { name: PROJECT }).click();
  await page.getByRole('link', { name: SHEET, exact: true }).click();
  await page.getByRole('heading', { level: 1, name: SHEET }).waitFor();
  await page.getByRole('region', { name: 'Review and sign-off' }).waitFor();
}

describeJourney('review and sign-off', (journey) => {
  let revisionPath = '';

  it('the designer freezes the amplifier sheet and asks the demo reviewer for a review', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.designer);
    await openAmplifier(page);
    const panel = page.getByRole('region', { name: 'Review and sign-off' });
    await panel.getByText('Not frozen yet', { exact: false }).waitFor();
    await saveScreenshot(page, 'review-1-sheet-before-freeze');

    await panel.getByRole('button', { name: 'Freeze revision' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('textbox', { name: /What this revision is/ }).fill('Input pair at gm/ID = 16, tail at 20 µA');
    await dialog.getByRole('combobox', { name: /Reviewer/ }).click();
    await page.getByRole('option', { name: `${REVIEWER_NAME} (reviewer)` }).click();
    await dialog.getByRole('textbox', { name: 'Note to the reviewer' }).fill('Please check the offset of the input pair');
    await saveScreenshot(page, 'review-2-freeze-dialog');
    const frozen = page.waitForResponse((r) => r.request().method() === 'POST' && /\/api\/sheets\/[^/]+\/revisions$/.test(r.url()));
    const requested = page.waitForResponse((r) => r.request().method() === 'POST' && r.url().endsWith('/review-requests'));
    await dialog.getByRole('button', { name: 'Freeze and request review' }).click();
    expect((await frozen).status()).toBe(201);
    expect((await requested).status()).toBe(201);

    await panel.getByLabel('Review state: In review').waitFor();
    const open = panel.getByRole('link', { name: 'Open r1' });
    revisionPath = new URL((await open.getAttribute('href'))!, journey.baseUrl).pathname;
    expect(revisionPath).toMatch(/^\/revisions\/[0-9a-f-]{36}$/);
    await saveScreenshot(page, 'review-3-sheet-in-review');
    await signOut(page);
    await page.close();
  });

  it('the reviewer sees the request in the inbox and its mail, comments on a device and approves', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.reviewer);

    await page.getByRole('navigation').getByRole('link', { name: 'My mail' }).click();
    const mail = page.getByRole('table', { name: 'My mail' });
    await mail.getByRole('button', { name: `Review requested: ${SHEET} r1` }).click();
    await page.getByLabel('Plain-text part').getByText(`Open the revision: `, { exact: false }).waitFor();
    expect(await page.getByLabel('Plain-text part').textContent()).toContain(revisionPath);
    await saveScreenshot(page, 'review-4-reviewer-mail');
    await page.keyboard.press('Escape');

    await page.getByRole('navigation').getByRole('link', { name: 'Reviews' }).click();
    const inbox = page.getByRole('table', { name: 'Assigned to me' });
    await inbox.getByText('Please check the offset of the input pair').waitFor();
    await saveScreenshot(page, 'review-5-reviewer-inbox');
    await inbox.getByRole('link', { name: `${SHEET} r1` }).click();
    await page.getByRole('heading', { level: 1, name: `${SHEET} r1` }).waitFor();
    expect(new URL(page.url()).pathname).toBe(revisionPath);

    await page.getByRole('button', { name: 'Comment on M1' }).click();
    await page.getByRole('textbox', { name: 'Comment', exact: true }).fill('gm/ID = 16 keeps the pair within the 2 mV offset budget');
    await page.getByRole('button', { name: 'Add comment' }).click();
    const comments = page.getByRole('list', { name: 'Comments' });
    await comments.getByText('gm/ID = 16 keeps the pair within the 2 mV offset budget').waitFor();
    expect(await comments.getByText('M1', { exact: true }).count()).toBe(1);
    await saveScreenshot(page, 'review-6-reviewer-comment');

    await page.getByRole('textbox', { name: /Decision comment/ }).fill('Signed off for layout');
    const decided = page.waitForResponse((r) => r.request().method() === 'POST' && r.url().endsWith('/decision'));
    await page.getByRole('button', { name: 'Approve and sign off' }).click();
    expect((await decided).status()).toBe(200);
    await page.getByText(`Signed off by ${REVIEWER_NAME}`).waitFor();
    await saveScreenshot(page, 'review-7-signed-off');
    await signOut(page);
    await page.close();
  });

  it('the designer sees "signed off" and cannot change that revision', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.designer);
    await openAmplifier(page);
    const panel = page.getByRole('region', { name: 'Review and sign-off' });
    await panel.getByLabel('Review state: Signed off').waitFor();
    await panel.getByText(`r1 signed off by ${REVIEWER_NAME}.`, { exact: false }).waitFor();
    await saveScreenshot(page, 'review-8-designer-sheet-signed-off');

    await panel.getByRole('link', { name: 'Open r1' }).click();
    await page.getByRole('heading', { level: 1, name: `${SHEET} r1` }).waitFor();
    await page.getByText('This revision can never change', { exact: false }).waitFor();
    // The page offers no way to change it, and the API refuses a direct attempt.
    for (const name of ['Approve and sign off', 'Request changes', 'Withdraw request', 'Freeze revision']) {
      expect(await page.getByRole('button', { name }).count()).toBe(0);
    }
    const refusal = await page.evaluate(async (path) => {
      const token = window.localStorage.getItem('channelwright.accessToken');
      const response = await fetch(`/api${path}`, { method: 'PATCH', headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' }, body: JSON.stringify({ message: 'quietly rewritten' }) });
      return { status: response.status, body: await response.json() };
    }, revisionPath);
    expect(refusal).toMatchObject({ status: 409, body: { code: 'REVISION_SIGNED_OFF' } });
    // Verified on opening: the stored rows, the stored hash and the signed hash (decision and audit trail) agree.
    await page.getByText('Hash verified').waitFor();
    await page.getByText('and what the reviewer signed off (decision and audit trail agree)', { exact: false }).waitFor();
    await saveScreenshot(page, 'review-9-designer-revision-signed-off');
    await page.close();
  });

  it('the admin finds both notices in the mail outbox', async () => {
    const page = await journey.newPage();
    await signIn(page, DEMO_USERS.admin);
    await page.getByRole('navigation').getByRole('link', { name: 'Mail outbox' }).click();
    const received = page.getByRole('table', { name: 'Received mail' });
    await received.getByRole('row').filter({ hasText: `Review requested: ${SHEET} r1` }).filter({ hasText: DEMO_USERS.reviewer }).waitFor();
    await received.getByRole('row').filter({ hasText: `Signed off: ${SHEET} r1` }).filter({ hasText: DEMO_USERS.designer }).waitFor();
    await saveScreenshot(page, 'review-10-admin-outbox');
    await page.close();
  });
});
