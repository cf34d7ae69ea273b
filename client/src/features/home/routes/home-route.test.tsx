import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, installFakeApi } from '../../../test/fake-api';
import { demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { wrenmoss } from '../../../test/fake-sheets';

function fakeServer(create?: () => ReturnType<typeof errorBody>) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: designer },
    'GET /api/projects': { body: [wrenmoss] },
    'POST /api/projects': ({ body }) => create?.() ?? { status: 201, body: { ...wrenmoss, ...(body as object), id: 'p-new', myRole: 'owner' } },
    'GET /api/projects/p-new': { body: { ...wrenmoss, id: 'p-new', name: 'Tide gauge' } },
    'GET /api/projects/p-new/sheets': { body: [] },
    'GET /api/projects/p-new/members': { body: [] },
  });
}

describe('the projects dashboard', { timeout: 20_000 }, () => {
  it("lists the user's projects with their role and counts", async () => {
    fakeServer();
    renderApp('/', { token: 'token-ines' });
    const table = await screen.findByRole('table', { name: 'Projects' }, { timeout: 10_000 });
    expect(within(table).getByRole('link', { name: wrenmoss.name })).toHaveAttribute('href', `/projects/${wrenmoss.id}`);
    expect(within(table).getByText('designer')).toBeInTheDocument();
  });

  it('creates a project and opens it', async () => {
    const api = fakeServer();
    const { user, router } = renderApp('/', { token: 'token-ines' });
    await user.click(await screen.findByRole('button', { name: 'New project' }, { timeout: 10_000 }));
    const form = await screen.findByRole('form', { name: 'New project' });
    await user.type(within(form).getByRole('textbox', { name: /^Name/ }), 'Tide gauge');
    await user.click(within(form).getByRole('button', { name: 'Create project' }));

    await waitFor(() => expect(api.to('POST /api/projects')[0]?.body).toEqual({ name: 'Tide gauge', description: '' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/projects/p-new'));
  });

  it('refuses an empty name in the dialog without asking the server', async () => {
    const api = fakeServer();
    const { user } = renderApp('/', { token: 'token-ines' });
    await user.click(await screen.findByRole('button', { name: 'New project' }, { timeout: 10_000 }));
    const form = await screen.findByRole('form', { name: 'New project' });
    await user.click(within(form).getByRole('button', { name: 'Create project' }));

    expect(within(form).getByRole('textbox', { name: /^Name/ })).toHaveAttribute('aria-invalid', 'true');
    expect(api.to('POST /api/projects')).toHaveLength(0);
  });
});
