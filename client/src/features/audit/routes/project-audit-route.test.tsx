import type { AuditEvent } from '@channelwright/shared/schemas';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { installFakeApi } from '../../../test/fake-api';
import { demoConfig, designer, reviewer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';

// Invented demo data.
const events: AuditEvent[] = [
  { id: 3, at: '2026-03-01T12:00:00.000Z', actor: { id: reviewer.id, displayName: reviewer.displayName, email: reviewer.email }, projectId: 'p-wren', entityType: 'review-request', entityId: 'req-1', action: 'review.approved', before: { state: 'open' }, after: { state: 'approved' }, summary: 'Signed off Two-stage amplifier r1' },
  { id: 2, at: '2026-03-01T10:05:00.000Z', actor: { id: designer.id, displayName: designer.displayName, email: designer.email }, projectId: 'p-wren', entityType: 'review-request', entityId: 'req-1', action: 'review.requested', before: null, after: { state: 'open' }, summary: `Asked ${reviewer.displayName} to review Two-stage amplifier r1` },
];

const auditUrls = (): URL[] =>
  vi
    .mocked(fetch)
    .mock.calls.map(([input]) => new URL(String(input), 'http://localhost'))
    .filter((url) => url.pathname === '/api/projects/p-wren/audit');

describe('the project audit page', () => {
  it('lists the events, filters them on the server, and downloads the filtered rows as CSV', async () => {
    // jsdom has no object URLs; the download hands its blob to one.
    const createObjectURL = vi.fn(() => 'blob:audit');
    Object.assign(URL, { createObjectURL, revokeObjectURL: vi.fn() });
    installFakeApi({
      'GET /api/config': { body: demoConfig },
      'GET /api/auth/me': { body: designer },
      'GET /api/projects/p-wren': { body: { id: 'p-wren', name: 'Wrenmoss sensor front end', description: '', version: 1, myRole: 'owner', createdBy: null, memberCount: 3, sheetCount: 3, createdAt: '2026-01-01T00:00:00.000Z', updatedAt: '2026-01-01T00:00:00.000Z' } },
      'GET /api/projects/p-wren/audit': { body: events },
    });
    const { user } = renderApp('/projects/p-wren/audit', { token: 'token-ines' });
    const table = await screen.findByRole('table', { name: 'Audit trail' }, { timeout: 5000 });
    expect(within(table).getAllByRole('row')).toHaveLength(3);
    expect(within(table).getByText('Signed off Two-stage amplifier r1')).toBeInTheDocument();

    await user.type(screen.getByRole('textbox', { name: 'Who (e-mail)' }), reviewer.email);
    await waitFor(() => expect(auditUrls().some((url) => url.searchParams.get('actor') === reviewer.email)).toBe(true));

    await user.click(screen.getByRole('button', { name: 'Download CSV' }));
    await waitFor(() => expect(createObjectURL).toHaveBeenCalled());
    const csv = auditUrls().find((url) => url.searchParams.get('format') === 'csv');
    expect(csv?.searchParams.get('actor')).toBe(reviewer.email);
  });
});
