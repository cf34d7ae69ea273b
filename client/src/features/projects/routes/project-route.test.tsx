import type { Project, ProjectMember, SheetSummary } from '@channelwright/shared/schemas';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, installFakeApi } from '../../../test/fake-api';
import { demoConfig, designer, reviewer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { BF180G_SUMMARY } from '../../../test/fake-compute-api';
import { NMOS_TABLE } from '../../../test/fake-characterisation';
import { storedSheet, wrenmoss } from '../../../test/fake-sheets';

const members: ProjectMember[] = [
  { userId: designer.id, email: designer.email, displayName: designer.displayName, role: 'owner', addedAt: '2025-03-04T09:00:00.000Z' },
  { userId: reviewer.id, email: reviewer.email, displayName: reviewer.displayName, role: 'reviewer', addedAt: '2025-03-04T09:00:00.000Z' },
];
const { devices: _devices, totals: _totals, ...amplifier } = storedSheet([]);
const sheets: SheetSummary[] = [amplifier];

function fakeServer(role: Project['myRole'] = 'owner', addMember?: () => ReturnType<typeof errorBody>, tables: unknown[] = []) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: designer },
    [`GET /api/projects/${wrenmoss.id}`]: { body: { ...wrenmoss, myRole: role } },
    [`GET /api/projects/${wrenmoss.id}/sheets`]: { body: sheets },
    [`GET /api/projects/${wrenmoss.id}/members`]: { body: members },
    [`POST /api/projects/${wrenmoss.id}/members`]: ({ body }) => addMember?.() ?? { status: 201, body: { ...members[1], ...(body as object), userId: 'u-new', displayName: 'New Member' } },
    [`PATCH /api/projects/${wrenmoss.id}/members/${reviewer.id}`]: ({ body }) => ({ body: { ...members[1], ...(body as object) } }),
    [`POST /api/projects/${wrenmoss.id}/sheets`]: ({ body }) => ({ status: 201, body: { ...storedSheet([]), id: 's-new', name: (body as { name: string }).name } }),
    'GET /api/processes': { body: [BF180G_SUMMARY] },
    [`GET /api/processes/${BF180G_SUMMARY.id}/tables`]: { body: tables },
  });
}

async function openProject() {
  const app = renderApp(`/projects/${wrenmoss.id}`, { token: 'token-ines' });
  await screen.findByRole('heading', { level: 1, name: wrenmoss.name }, { timeout: 10_000 });
  await screen.findByRole('table', { name: 'Members' });
  return app;
}

describe('the project page', { timeout: 20_000 }, () => {
  it('lists the sheets with their process version, and the members with their roles', async () => {
    fakeServer();
    await openProject();
    const table = await screen.findByRole('table', { name: 'Sheets' });
    expect(within(table).getByRole('link', { name: 'Two-stage amplifier' })).toHaveAttribute('href', '/sheets/s-amp');
    expect(within(table).getByText('BF180-G v2')).toBeInTheDocument();
    expect(screen.getByRole('combobox', { name: `Role of ${reviewer.displayName}` })).toHaveValue('Reviewer');
    expect(screen.getByRole('link', { name: 'Audit trail' }).getAttribute('href')).toMatch(/^\/projects\/[^/]+\/audit$/);
  });

  it('lets an owner add a member by e-mail, showing a refusal beside the e-mail', async () => {
    const api = fakeServer('owner', () => errorBody(404, 'USER_NOT_FOUND', 'No account has this e-mail', 'email'));
    const { user } = await openProject();
    const form = screen.getByRole('form', { name: 'Add a member' });

    await user.type(within(form).getByRole('textbox', { name: 'Add by e-mail' }), 'nobody@brackenfold.example');
    await user.click(within(form).getByRole('button', { name: 'Add member' }));

    await waitFor(() => expect(api.to(`POST /api/projects/${wrenmoss.id}/members`)).toHaveLength(1));
    expect(api.to(`POST /api/projects/${wrenmoss.id}/members`)[0].body).toEqual({ email: 'nobody@brackenfold.example', role: 'designer' });
    await waitFor(() => expect(within(form).getByRole('textbox', { name: 'Add by e-mail' })).toHaveAccessibleDescription('No account has this e-mail'));
  });

  it("lets an owner change a member's role", async () => {
    const api = fakeServer();
    const { user } = await openProject();

    await user.click(screen.getByRole('combobox', { name: `Role of ${reviewer.displayName}` }));
    await user.click(await screen.findByRole('option', { name: 'Viewer' }));

    await waitFor(() => expect(api.to(`PATCH /api/projects/${wrenmoss.id}/members/${reviewer.id}`)[0]?.body).toEqual({ role: 'viewer' }));
  });

  it('creates a sheet on the chosen process profile version and opens it', async () => {
    const api = fakeServer('designer');
    const { user, router } = await openProject();

    await user.click(screen.getByRole('button', { name: 'New sheet' }));
    const dialog = await screen.findByRole('form', { name: 'New sheet' });
    await user.type(within(dialog).getByRole('textbox', { name: /^Name/ }), 'Sleep switch');
    await user.click(within(dialog).getByRole('combobox', { name: /^Process profile/ }));
    await user.click(await screen.findByRole('option', { name: 'BF180-G' }));
    expect(within(dialog).getByRole('combobox', { name: 'Version' })).toHaveValue('v2 (latest)');
    await user.click(within(dialog).getByRole('button', { name: 'Create sheet' }));

    await waitFor(() => expect(api.to(`POST /api/projects/${wrenmoss.id}/sheets`)).toHaveLength(1));
    expect(api.to(`POST /api/projects/${wrenmoss.id}/sheets`)[0].body).toEqual({
      name: 'Sleep switch',
      description: '',
      processId: BF180G_SUMMARY.id,
      processVersion: 2,
      corner: 'TT',
      model: 'all-region',
      temperature: null,
    });
    await waitFor(() => expect(router.state.location.pathname).toBe('/sheets/s-new'));
  });

  it('offers the table model for a new sheet only once the chosen version has tables', async () => {
    const api = fakeServer('designer', undefined, [NMOS_TABLE]);
    const { user } = await openProject();
    await user.click(screen.getByRole('button', { name: 'New sheet' }));
    const dialog = await screen.findByRole('form', { name: 'New sheet' });
    expect(within(dialog).queryByRole('radio', { name: 'Tables' })).not.toBeInTheDocument();
    await user.type(within(dialog).getByRole('textbox', { name: /^Name/ }), 'Bias mirror');
    await user.click(within(dialog).getByRole('combobox', { name: /^Process profile/ }));
    await user.click(await screen.findByRole('option', { name: 'BF180-G' }));
    await user.click(await within(dialog).findByRole('radio', { name: 'Tables' }));
    await user.click(within(dialog).getByRole('button', { name: 'Create sheet' }));
    await waitFor(() => expect(api.to(`POST /api/projects/${wrenmoss.id}/sheets`)).toHaveLength(1));
    expect(api.to(`POST /api/projects/${wrenmoss.id}/sheets`)[0].body).toMatchObject({ name: 'Bias mirror', processVersion: 2, model: 'table' });
  });

  it('shows a viewer the sheets and members without the controls to change them', async () => {
    fakeServer('viewer');
    await openProject();
    await screen.findByRole('table', { name: 'Sheets' });
    expect(screen.queryByRole('button', { name: 'New sheet' })).not.toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Add a member' })).not.toBeInTheDocument();
    expect(screen.queryByRole('combobox', { name: `Role of ${reviewer.displayName}` })).not.toBeInTheDocument();
    expect(within(screen.getByRole('table', { name: 'Members' })).getByText('Reviewer')).toBeInTheDocument();
  });
});
