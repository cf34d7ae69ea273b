import type { ReceivedMail } from '@channelwright/shared/schemas';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi } from '../../../test/fake-api';
import { admin, demoConfig, designer, reviewer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';

// Invented demo data.
const mail: ReceivedMail = {
  id: 'm-1',
  receivedAt: '2026-03-01T10:05:01.000Z',
  from: 'Channelwright <no-reply@localhost>',
  to: [reviewer.email],
  subject: 'Review requested: Two-stage amplifier r1',
  text: 'A sizing waits for your review\n\nOpen the revision: http://localhost:3000/revisions/rev-1',
  html: '<p><a href="http://localhost:3000/revisions/rev-1">Open the revision</a></p>',
  messageId: '<m-1@localhost>',
};

describe('the mail pages', () => {
  it('shows admins what the local sink received, and each message with its plain-text part', async () => {
    installFakeApi({
      'GET /api/config': { body: demoConfig },
      'GET /api/auth/me': { body: admin },
      'GET /api/admin/mail': { body: [mail] },
      'GET /api/admin/mail/outbox': { body: [{ id: 'o-1', createdAt: mail.receivedAt, to: reviewer.email, subject: mail.subject, link: 'http://localhost:3000/revisions/rev-1', state: 'sent', attempts: 1, lastError: null, sentAt: mail.receivedAt }] },
    });
    const { user } = renderApp('/admin/mail', { token: 'token-tobias' });
    const table = await screen.findByRole('table', { name: 'Received mail' }, { timeout: 5000 });
    expect(within(table).getByText(reviewer.email)).toBeInTheDocument();
    await user.click(within(table).getByRole('button', { name: mail.subject }));
    expect(await screen.findByLabelText('Plain-text part')).toHaveTextContent('Open the revision: http://localhost:3000/revisions/rev-1');
  });

  it('gives everyone a "My mail" page with the mail sent to them', async () => {
    installFakeApi({
      'GET /api/config': { body: demoConfig },
      'GET /api/auth/me': { body: designer },
      'GET /api/mail/mine': { body: [{ ...mail, to: [designer.email], subject: 'Signed off: Two-stage amplifier r1' }] },
    });
    renderApp('/mail', { token: 'token-ines' });
    const table = await screen.findByRole('table', { name: 'My mail' }, { timeout: 5000 });
    expect(within(table).getByRole('button', { name: 'Signed off: Two-stage amplifier r1' })).toBeInTheDocument();
  });

  it('keeps the outbox page from members who are not admins', async () => {
    installFakeApi({ 'GET /api/config': { body: demoConfig }, 'GET /api/auth/me': { body: designer } });
    renderApp('/admin/mail', { token: 'token-ines' });
    expect(await screen.findByRole('heading', { name: 'Nothing at this address' }, { timeout: 5000 })).toBeInTheDocument();
  });
});
