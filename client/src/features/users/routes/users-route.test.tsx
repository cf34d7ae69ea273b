import type { User } from '@channelwright/shared/schemas';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, installFakeApi } from '../../../test/fake-api';
import { admin, demoConfig, designer, reviewer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';

/** A small in-memory users service: PATCH changes what the next GET returns. */
function fakeUsersServer(options: { refuseWith?: ReturnType<typeof errorBody> } = {}) {
  const users = new Map<string, User>([admin, designer, reviewer].map((u) => [u.id, { ...u }]));
  const api = installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: admin },
    'GET /api/users': () => ({ body: [...users.values()] }),
    [`PATCH /api/users/${reviewer.id}`]: ({ body }) => {
      if (options.refuseWith) return options.refuseWith;
      const updated = { ...users.get(reviewer.id)!, ...(body as Partial<User>) };
      users.set(reviewer.id, updated);
      return { body: updated };
    },
  });
  return api;
}

async function openUsersPage() {
  const app = renderApp('/admin/users', { token: 'token-tobias' });
  const table = await screen.findByRole('table', { name: 'Users' });
  await within(table).findByText(reviewer.displayName);
  return { ...app, table };
}

describe('the users page', () => {
  it('lists every account with its role, maintainer flag and access', async () => {
    fakeUsersServer();
    const { table } = await openUsersPage();

    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(4); // header + three accounts
    expect(within(table).getByText(designer.email)).toBeInTheDocument();
    expect(screen.getByRole('combobox', { name: `Role of ${designer.displayName}` })).toHaveValue('Member');
    expect(screen.getByRole('combobox', { name: `Role of ${admin.displayName}` })).toHaveValue('Administrator');
    expect(screen.getByRole('switch', { name: `${admin.displayName} maintains process profiles` })).toBeChecked();
    expect(screen.getByRole('switch', { name: `${reviewer.displayName} maintains process profiles` })).not.toBeChecked();
    expect(screen.getByRole('switch', { name: `${reviewer.displayName} may sign in` })).toBeChecked();
  });

  it('makes a user a process maintainer and shows the stored result', async () => {
    const api = fakeUsersServer();
    const { user } = await openUsersPage();

    await user.click(screen.getByRole('switch', { name: `${reviewer.displayName} maintains process profiles` }));

    const patches = api.to(`PATCH /api/users/${reviewer.id}`);
    expect(patches.map((p) => p.body)).toEqual([{ processMaintainer: true }]);
    // The list is read again from the server after the change.
    await screen.findByRole('switch', { name: `${reviewer.displayName} maintains process profiles`, checked: true });
    expect(api.to('GET /api/users').length).toBeGreaterThanOrEqual(2);
  });

  it('grants a member the whole process library, and shows it as granted for administrators and maintainers', async () => {
    const api = fakeUsersServer();
    const { user } = await openUsersPage();

    expect(screen.getByRole('switch', { name: `${admin.displayName} reads the whole process library` })).toBeChecked();
    expect(screen.getByRole('switch', { name: `${admin.displayName} reads the whole process library` })).toBeDisabled();
    await user.click(screen.getByRole('switch', { name: `${reviewer.displayName} reads the whole process library` }));

    expect(api.to(`PATCH /api/users/${reviewer.id}`).map((p) => p.body)).toEqual([{ libraryAccess: true }]);
    await screen.findByRole('switch', { name: `${reviewer.displayName} reads the whole process library`, checked: true });
  });

  it('turns an account off', async () => {
    const api = fakeUsersServer();
    const { user } = await openUsersPage();

    await user.click(screen.getByRole('switch', { name: `${reviewer.displayName} may sign in` }));

    expect(api.to(`PATCH /api/users/${reviewer.id}`)[0]?.body).toEqual({ disabled: true });
    await screen.findByRole('switch', { name: `${reviewer.displayName} may sign in`, checked: false });
  });

  it('changes a role through the role list', async () => {
    const api = fakeUsersServer();
    const { user } = await openUsersPage();

    await user.click(screen.getByRole('combobox', { name: `Role of ${reviewer.displayName}` }));
    await user.click(await screen.findByRole('option', { name: 'Administrator' }));

    expect(api.to(`PATCH /api/users/${reviewer.id}`)[0]?.body).toEqual({ role: 'admin' });
    await waitFor(() =>
      expect(screen.getByRole('combobox', { name: `Role of ${reviewer.displayName}` })).toHaveValue('Administrator'),
    );
  });

  it('does not let administrators lock themselves out', async () => {
    fakeUsersServer();
    await openUsersPage();
    expect(screen.getByRole('combobox', { name: `Role of ${admin.displayName}` })).toBeDisabled();
    expect(screen.getByRole('switch', { name: `${admin.displayName} may sign in` })).toBeDisabled();
  });

  it("shows the server's refusal as a notification and puts the old value back", async () => {
    const api = fakeUsersServer({ refuseWith: errorBody(403, 'FORBIDDEN', 'Only administrators may change accounts.') });
    const { user } = await openUsersPage();

    await user.click(screen.getByRole('switch', { name: `${reviewer.displayName} may sign in` }));

    expect(await screen.findByText('Only administrators may change accounts.')).toBeInTheDocument();
    expect(api.to(`PATCH /api/users/${reviewer.id}`)).toHaveLength(1);
    // The switch moved at once; the refusal puts it back.
    await waitFor(() => expect(screen.getByRole('switch', { name: `${reviewer.displayName} may sign in` })).toBeChecked());
  });
});
