import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { CAUTION_TEXT } from '../components/caution-banner';
import { getAuthToken } from '../lib/session/auth-token';
import { errorBody, installFakeApi } from '../test/fake-api';
import { admin, demoConfig, designer } from '../test/fixtures';
import { renderApp } from '../test/render-app';

function signedInAs(user: typeof designer) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: user },
    'GET /api/users': { body: [admin, designer] },
    'GET /api/projects': { body: [] },
  });
}

describe('the signed-in shell', () => {
  it('greets the user, shows the caution and the invented-data label, and offers Home', async () => {
    signedInAs(designer);
    renderApp('/', { token: 'token-ines' });

    expect(await screen.findByRole('heading', { name: 'Welcome, Ines Marlow' })).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Your projects' })).toBeInTheDocument();
    expect(screen.getByRole('note', { name: 'Caution' })).toHaveTextContent(CAUTION_TEXT);
    expect(await screen.findByText('invented demo data')).toBeInTheDocument();
    const nav = screen.getByRole('navigation');
    expect(within(nav).getByRole('link', { name: 'Home' })).toHaveAttribute('href', '/');
    expect(within(nav).queryByRole('link', { name: 'Users' })).not.toBeInTheDocument();
  });

  it('gives administrators the Users page under Administration', async () => {
    signedInAs(admin);
    const { user, router } = renderApp('/', { token: 'token-tobias' });

    const nav = await screen.findByRole('navigation');
    expect(within(nav).getByText('Administration')).toBeInTheDocument();
    await user.click(await within(nav).findByRole('link', { name: 'Users' }));

    expect(await screen.findByRole('heading', { name: 'Users' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/admin/users');
    expect(screen.getByRole('note', { name: 'Caution' })).toBeInTheDocument();
  });

  it('signs out from the account menu and lands on sign-in without the token', async () => {
    signedInAs(designer);
    const { user, router } = renderApp('/', { token: 'token-ines' });

    await user.click(await screen.findByRole('button', { name: 'Account menu for Ines Marlow' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Sign out' }));

    expect(await screen.findByRole('form', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(getAuthToken()).toBeNull();
  });

  it('sends a visitor with an expired token to sign-in, remembering where they were going', async () => {
    installFakeApi({
      'GET /api/config': { body: demoConfig },
      'GET /api/auth/me': errorBody(401, 'UNAUTHENTICATED', 'Your session has expired.'),
    });
    const { router } = renderApp('/admin/users', { token: 'token-stale' });

    expect(await screen.findByRole('form', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/admin/users')}`);
    expect(getAuthToken()).toBeNull();
  });

  it('answers an unknown address with the not-found page inside the shell', async () => {
    signedInAs(designer);
    renderApp('/no/such/page', { token: 'token-ines' });

    expect(await screen.findByRole('heading', { name: 'Nothing at this address' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to home' })).toHaveAttribute('href', '/');
    expect(screen.getByRole('note', { name: 'Caution' })).toBeInTheDocument();
  });

  it('switches between the light and dark schemes from the account menu', async () => {
    signedInAs(designer);
    const { user } = renderApp('/', { token: 'token-ines' });

    await user.click(await screen.findByRole('button', { name: 'Account menu for Ines Marlow' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Use the dark scheme' }));

    expect(document.documentElement).toHaveAttribute('data-mantine-color-scheme', 'dark');
    await user.click(screen.getByRole('button', { name: 'Account menu for Ines Marlow' }));
    expect(await screen.findByRole('menuitem', { name: 'Use the light scheme' })).toBeInTheDocument();
  });
});
