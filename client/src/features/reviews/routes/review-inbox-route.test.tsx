import type { ReviewRequest } from '@channelwright/shared/schemas';
import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { installFakeApi } from '../../../test/fake-api';
import { demoConfig, designer, reviewer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';

// Invented demo data.
const request = (id: string, sheetName: string, state: ReviewRequest['state']): ReviewRequest => ({
  id,
  projectId: 'p-wren',
  projectName: 'Wrenmoss sensor front end',
  sheetId: `s-${id}`,
  sheetName,
  revision: { id: `rev-${id}`, number: 2, label: 'r2', message: 'Tail at 20 µA', hash: 'c'.repeat(64), state: state === 'open' ? 'in-review' : 'signed-off' },
  requestedBy: { id: designer.id, displayName: designer.displayName },
  reviewer: { id: reviewer.id, displayName: reviewer.displayName, email: reviewer.email },
  note: state === 'open' ? 'Offset budget is 2 mV' : '',
  state,
  createdAt: '2026-03-01T10:00:00.000Z',
  decidedAt: null,
  decisionComment: null,
  signedHash: null,
});

/** The query strings the page sent to GET /api/review-requests (the fake API keys handlers by path only). */
function inboxSearches(): string[] {
  return vi
    .mocked(fetch)
    .mock.calls.map(([input]) => new URL(String(input), 'http://localhost'))
    .filter((url) => url.pathname === '/api/review-requests')
    .map((url) => url.searchParams.toString());
}

describe('the review inbox', () => {
  it('lists the requests waiting for the reviewer, with links to their revisions, and asks the server for the chosen view', async () => {
    const api = installFakeApi({
      'GET /api/config': { body: demoConfig },
      'GET /api/auth/me': { body: reviewer },
      'GET /api/review-requests': { body: [request('a', 'Two-stage amplifier', 'open')] },
    });
    const { user } = renderApp('/reviews', { token: 'token-hollis' });
    const table = await screen.findByRole('table', { name: 'Assigned to me' }, { timeout: 5000 });
    const link = within(table).getByRole('link', { name: 'Two-stage amplifier r2' });
    expect(link).toHaveAttribute('href', '/revisions/rev-a');
    expect(within(table).getByText('Offset budget is 2 mV')).toBeInTheDocument();

    await user.click(screen.getByText('Asked by me'));
    await screen.findByRole('table', { name: 'Asked by me' });
    await user.click(screen.getByRole('switch', { name: 'Open requests only' }));
    await screen.findByRole('table', { name: 'Asked by me' });
    expect(api.to('GET /api/review-requests').length).toBeGreaterThanOrEqual(3);
    expect(inboxSearches()).toEqual(expect.arrayContaining(['mine=assigned&state=open', 'mine=authored&state=open', 'mine=authored']));
  });
});
