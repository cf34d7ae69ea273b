import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { createQueryClient } from '../../../lib/query-client';
import { setAuthToken } from '../../../lib/session/auth-token';
import { currentUserQueryOptions } from '../../../lib/session/current-user';
import { errorBody, installFakeApi } from '../../../test/fake-api';
import { renderWithProviders } from '../../../test/render-app';
import { designer, reviewer } from '../../../test/fixtures';
import { draftReviewState, project, reviewRequest, revision } from '../testing/revision-fixtures';
import { RevisionPanel } from './revision-panel';

const LOADED = { timeout: 5000 };

function renderPanel() {
  setAuthToken('token-ines');
  const queryClient = createQueryClient();
  queryClient.setQueryData(currentUserQueryOptions().queryKey, designer);
  renderWithProviders(
    <MemoryRouter>
      <RevisionPanel sheetId="s-amp" sheetName="Two-stage amplifier" />
    </MemoryRouter>,
    queryClient,
  );
  return userEvent.setup();
}

function fakeServer(options: { refuseRequest?: boolean } = {}) {
  let state = draftReviewState();
  const members = [
    { userId: designer.id, email: designer.email, displayName: designer.displayName, role: 'owner', addedAt: '2026-01-01T00:00:00.000Z' },
    { userId: reviewer.id, email: reviewer.email, displayName: reviewer.displayName, role: 'reviewer', addedAt: '2026-01-01T00:00:00.000Z' },
    { userId: 'u-viewer', email: 'viewer@brackenfold.example', displayName: 'Viewer', role: 'viewer', addedAt: '2026-01-01T00:00:00.000Z' },
  ];
  return installFakeApi({
    'GET /api/auth/me': { body: designer },
    'GET /api/sheets/s-amp/review-state': () => ({ body: state }),
    'GET /api/projects/p-wren': { body: project('owner') },
    'GET /api/projects/p-wren/members': { body: members },
    'POST /api/sheets/s-amp/revisions': () => {
      const { devices: _devices, sheet: _sheet, ...summary } = revision({ state: 'draft' });
      state = draftReviewState({ latestRevision: summary, revisions: [summary], changedSinceLatest: false });
      return { status: 201, body: revision({ state: 'draft' }) };
    },
    'POST /api/revisions/rev-1/review-requests': () => (options.refuseRequest ? errorBody(400, 'REVIEWER_NOT_ELIGIBLE', 'The reviewer must be a member of this project with the owner or reviewer role', 'reviewerId') : { status: 201, body: reviewRequest() }),
  });
}

describe('the revision panel of a sheet', () => {
  it('freezes the sheet and asks the chosen reviewer, offering only members who may review and not the author', async () => {
    const api = fakeServer();
    const user = renderPanel();
    expect(await screen.findByText(/Not frozen yet/, {}, LOADED)).toBeInTheDocument();
    await user.click(await screen.findByRole('button', { name: 'Freeze revision' }, LOADED));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByRole('textbox', { name: /What this revision is/ }), 'Input pair at gm/ID = 16');
    await user.click(within(dialog).getByRole('combobox', { name: /Reviewer/ }));
    const options = (await screen.findAllByRole('option')).map((option) => option.textContent);
    expect(options).toEqual([`${reviewer.displayName} (reviewer)`]);
    await user.click(screen.getByRole('option', { name: `${reviewer.displayName} (reviewer)` }));
    await user.click(within(dialog).getByRole('button', { name: 'Freeze and request review' }));

    expect(await screen.findByText(`Two-stage amplifier frozen as r1 and sent to ${reviewer.displayName} for review`, {}, LOADED)).toBeInTheDocument();
    expect(api.to('POST /api/sheets/s-amp/revisions').map((r) => r.body)).toEqual([{ message: 'Input pair at gm/ID = 16' }]);
    expect(api.to('POST /api/revisions/rev-1/review-requests').map((r) => r.body)).toEqual([{ reviewerId: reviewer.id, note: '' }]);
  });

  it('refuses to freeze without a message, and keeps a frozen revision when the review request is refused', async () => {
    const api = fakeServer({ refuseRequest: true });
    const user = renderPanel();
    await user.click(await screen.findByRole('button', { name: 'Freeze revision' }, LOADED));
    const dialog = await screen.findByRole('dialog');
    await user.click(within(dialog).getByRole('button', { name: 'Freeze and request review' }));
    expect(await within(dialog).findByText('message must not be empty: say what this revision is')).toBeInTheDocument();
    expect(api.to('POST /api/sheets/s-amp/revisions')).toHaveLength(0);

    await user.type(within(dialog).getByRole('textbox', { name: /What this revision is/ }), 'First try');
    await user.click(within(dialog).getByRole('combobox', { name: /Reviewer/ }));
    await user.click(await screen.findByRole('option', { name: `${reviewer.displayName} (reviewer)` }));
    await user.click(within(dialog).getByRole('button', { name: 'Freeze and request review' }));
    expect(await within(dialog).findByText('Frozen as r1, but the review was not requested')).toBeInTheDocument();
    // A retry asks again without freezing a second revision.
    await user.click(within(dialog).getByRole('button', { name: 'Request review' }));
    expect(api.to('POST /api/revisions/rev-1/review-requests')).toHaveLength(2);
    expect(api.to('POST /api/sheets/s-amp/revisions')).toHaveLength(1);
  });
});
