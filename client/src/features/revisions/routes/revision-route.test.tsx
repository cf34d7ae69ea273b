import type { RevisionComment } from '@channelwright/shared/schemas';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi } from '../../../test/fake-api';
import { demoConfig, designer, reviewer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { HASH_OF_R1, M1, project, reviewRequest, revision } from '../testing/revision-fixtures';

/** The page waits on several reads (revision, project, requests); a two-core machine can take a while. */
const LOADED = { timeout: 5000 };

/** The revision routes of the server, in memory: a decision changes what the next reads return. */
function fakeRevisionServer(me: typeof designer, options: { tampered?: boolean; signedOff?: boolean } = {}) {
  let current = revision();
  if (options.signedOff) current = { ...current, state: 'signed-off', signOff: { reviewRequestId: 'req-1', by: { id: reviewer.id, displayName: reviewer.displayName }, at: '2026-03-01T12:00:00.000Z', hash: HASH_OF_R1 } };
  let request = reviewRequest();
  const comments: RevisionComment[] = [];
  const api = installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: me },
    'GET /api/projects/p-wren': { body: project(me.id === reviewer.id ? 'reviewer' : 'owner') },
    'GET /api/revisions/rev-1': () => ({ body: current }),
    'GET /api/revisions/rev-1/review-requests': () => ({ body: [request] }),
    'GET /api/revisions/rev-1/diff': {
      body: { revisionId: 'rev-1', againstId: 'rev-0', againstLabel: 'r0', added: [], removed: [], sheetChanges: [], changed: [{ id: M1.id, name: 'M1', changes: [{ path: 'targets.l', from: 0.36e-6, to: 0.5e-6 }] }] },
    },
    'GET /api/revisions/rev-1/verify': () => ({
      body: {
        valid: !options.tampered,
        algorithm: 'sha-256',
        storedHash: HASH_OF_R1,
        computedHash: options.tampered ? 'b'.repeat(64) : HASH_OF_R1,
        signatures: current.signOff ? [{ reviewRequestId: 'req-1', signedHash: HASH_OF_R1, auditedHash: HASH_OF_R1, matches: !options.tampered }] : [],
        problems: options.tampered ? ['The stored rows no longer hash to the hash stored with the revision.'] : [],
      },
    }),
    'GET /api/revisions/rev-1/comments': () => ({ body: comments }),
    'POST /api/revisions/rev-1/comments': ({ body }) => {
      const { body: text, deviceId } = body as { body: string; deviceId?: string };
      const comment: RevisionComment = { id: `c-${comments.length + 1}`, revisionId: 'rev-1', device: deviceId ? { id: deviceId, name: 'M1' } : null, author: { id: me.id, displayName: me.displayName }, body: text, createdAt: '2026-03-01T11:00:00.000Z' };
      comments.push(comment);
      return { status: 201, body: comment };
    },
    'POST /api/review-requests/req-1/decision': ({ body }) => {
      const { comment } = body as { comment: string };
      request = { ...request, state: 'approved', decidedAt: '2026-03-01T12:00:00.000Z', decisionComment: comment, signedHash: HASH_OF_R1, revision: { ...request.revision, state: 'signed-off' } };
      current = { ...current, state: 'signed-off', signOff: { reviewRequestId: 'req-1', by: { id: reviewer.id, displayName: reviewer.displayName }, at: '2026-03-01T12:00:00.000Z', hash: HASH_OF_R1 } };
      return { body: request };
    },
  });
  return api;
}

describe('the revision page', () => {
  it('shows the frozen devices with their warnings, the changes since the last sign-off and the open request', async () => {
    fakeRevisionServer(designer);
    renderApp('/revisions/rev-1', { token: 'token-ines' });
    await screen.findByRole('heading', { level: 1, name: 'Two-stage amplifier r1' }, LOADED);
    const devices = screen.getByRole('table', { name: 'Frozen devices' });
    expect(within(devices).getByText('M1')).toBeInTheDocument();
    expect(within(devices).getByText('1 warning')).toBeInTheDocument();
    expect(within(screen.getByRole('list', { name: 'Warnings in this revision' })).getByText(/L = 180 nm is less than twice lmin/)).toBeInTheDocument();
    const changes = await screen.findByRole('table', { name: 'Changes of M1' });
    expect(within(changes).getByText('targets.l')).toBeInTheDocument();
    expect(within(changes).getByText('360 nm')).toBeInTheDocument();
    expect(within(changes).getByText('500 nm')).toBeInTheDocument();
    // The requester may withdraw, not decide.
    expect(await screen.findByRole('button', { name: 'Withdraw request' }, LOADED)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Approve and sign off' })).not.toBeInTheDocument();
  });

  it('lets the reviewer comment on a device from its row, and shows the comment', async () => {
    const api = fakeRevisionServer(reviewer);
    const { user } = renderApp('/revisions/rev-1', { token: 'token-hollis' });
    await screen.findByRole('heading', { level: 1, name: 'Two-stage amplifier r1' }, LOADED);
    await user.click(await screen.findByRole('button', { name: 'Comment on M1' }, LOADED));
    await user.type(screen.getByRole('textbox', { name: 'Comment' }), 'gm/ID of 16 is fine');
    await user.click(screen.getByRole('button', { name: 'Add comment' }));
    expect(api.to('POST /api/revisions/rev-1/comments').map((r) => r.body)).toEqual([{ body: 'gm/ID of 16 is fine', deviceId: M1.id }]);
    const list = await screen.findByRole('list', { name: 'Comments' });
    expect(await within(list).findByText('gm/ID of 16 is fine')).toBeInTheDocument();
  });

  it('lets the assigned reviewer approve, and then shows the sign-off', async () => {
    const api = fakeRevisionServer(reviewer);
    const { user } = renderApp('/revisions/rev-1', { token: 'token-hollis' });
    await user.type(await screen.findByRole('textbox', { name: /Decision comment/ }, LOADED), 'Signed off for layout');
    await user.click(screen.getByRole('button', { name: 'Approve and sign off' }));
    expect(api.to('POST /api/review-requests/req-1/decision').map((r) => r.body)).toEqual([{ decision: 'approve', comment: 'Signed off for layout' }]);
    expect(await screen.findByText(`Signed off by ${reviewer.displayName}`)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Approve and sign off' })).not.toBeInTheDocument();
  });

  it('verifies the hash on opening, without a button press, and says so when the stored rows no longer match it', async () => {
    fakeRevisionServer(designer, { tampered: true });
    renderApp('/revisions/rev-1', { token: 'token-ines' });
    expect(await screen.findByText('Hash mismatch', {}, LOADED)).toBeInTheDocument();
    expect(screen.getByText('b'.repeat(64))).toBeInTheDocument();
    expect(screen.getByText('The stored rows no longer hash to the hash stored with the revision.')).toBeInTheDocument();
  });

  it('flags a signed-off revision that fails verification instead of showing its sign-off', async () => {
    fakeRevisionServer(designer, { tampered: true, signedOff: true });
    renderApp('/revisions/rev-1', { token: 'token-ines' });
    expect(await screen.findByText('Sign-off does not hold: this revision failed verification', {}, LOADED)).toBeInTheDocument();
    expect(screen.queryByText(`Signed off by ${reviewer.displayName}`)).not.toBeInTheDocument();
  });

  it('shows a signed-off revision that verifies as signed off, with the hash verified', async () => {
    fakeRevisionServer(designer, { signedOff: true });
    renderApp('/revisions/rev-1', { token: 'token-ines' });
    expect(await screen.findByText('Hash verified', {}, LOADED)).toBeInTheDocument();
    expect(screen.getByText(`Signed off by ${reviewer.displayName}`)).toBeInTheDocument();
  });
});
