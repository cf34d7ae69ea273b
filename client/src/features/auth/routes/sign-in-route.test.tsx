import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AUTH_TOKEN_STORAGE_KEY } from '../../../lib/session/auth-token';
import { errorBody, installFakeApi } from '../../../test/fake-api';
import { demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';

function fakeServer() {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'POST /api/auth/login': ({ body }) => {
      const { email, password } = body as { email: string; password: string };
      if (email === designer.email && password === 'wrenmoss-demo') return { body: { accessToken: 'token-ines', user: designer } };
      return errorBody(401, 'INVALID_CREDENTIALS', 'The e-mail or the password is wrong.');
    },
    'GET /api/auth/me': ({ headers }) =>
      headers.get('Authorization') === 'Bearer token-ines' ? { body: designer } : errorBody(401, 'UNAUTHENTICATED', 'Sign in first.'),
  });
}

async function signInPage() {
  const app = renderApp('/sign-in');
  const form = await screen.findByRole('form', { name: 'Sign in' });
  return { ...app, form };
}

describe('the sign-in page', () => {
  it('asks for the e-mail and the password when both are left empty, and sends nothing', async () => {
    const api = fakeServer();
    const { user, form } = await signInPage();

    await user.click(within(form).getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('E-mail is required')).toBeInTheDocument();
    expect(screen.getByText('Password is required')).toBeInTheDocument();
    expect(screen.getByLabelText(/E-mail/)).toHaveAttribute('aria-invalid', 'true');
    expect(api.to('POST /api/auth/login')).toHaveLength(0);
  });

  it('refuses an e-mail address that is not one', async () => {
    const api = fakeServer();
    const { user } = await signInPage();

    await user.type(screen.getByLabelText(/E-mail/), 'ines-at-brackenfold');
    await user.type(screen.getByLabelText(/Password/), 'wrenmoss-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter a valid e-mail address')).toBeInTheDocument();
    expect(screen.queryByText('Password is required')).not.toBeInTheDocument();
    expect(api.to('POST /api/auth/login')).toHaveLength(0);
  });

  it("shows the server's refusal of a wrong password and stays signed out", async () => {
    const api = fakeServer();
    const { user, router } = await signInPage();

    await user.type(screen.getByLabelText(/E-mail/), designer.email);
    await user.type(screen.getByLabelText(/Password/), 'not-the-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Sign-in failed');
    expect(alert).toHaveTextContent('The e-mail or the password is wrong.');
    expect(api.to('POST /api/auth/login')[0]?.headers.has('Authorization')).toBe(false);
    expect(window.localStorage.getItem(AUTH_TOKEN_STORAGE_KEY)).toBeNull();
    expect(router.state.location.pathname).toBe('/sign-in');
  });

  it('signs in with a normalised e-mail, keeps the token and opens the home page', async () => {
    const api = fakeServer();
    const { user, router } = await signInPage();

    await user.type(screen.getByLabelText(/E-mail/), '  Designer@Brackenfold.example ');
    await user.type(screen.getByLabelText(/Password/), 'wrenmoss-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { name: `Welcome, ${designer.displayName}` })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/');
    expect(api.to('POST /api/auth/login')[0]?.body).toEqual({ email: designer.email, password: 'wrenmoss-demo' });
    expect(window.localStorage.getItem(AUTH_TOKEN_STORAGE_KEY)).toBe('token-ines');
  });

  it('returns to the page the user first asked for', async () => {
    fakeServer();
    const { user, router } = renderApp('/admin/users');

    await screen.findByRole('form', { name: 'Sign in' });
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/admin/users')}`);
    await user.type(screen.getByLabelText(/E-mail/), designer.email);
    await user.type(screen.getByLabelText(/Password/), 'wrenmoss-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    // A member is not an administrator: the users page answers as if it did not exist.
    expect(await screen.findByRole('heading', { name: 'Nothing at this address' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/admin/users');
  });

  it('offers sign-up only when the server allows it', async () => {
    installFakeApi({ 'GET /api/config': { body: { ...demoConfig, signupEnabled: true } } });
    renderApp('/sign-in');
    expect(await screen.findByRole('link', { name: 'Create an account' })).toHaveAttribute('href', '/sign-up');
  });

  it('lists the invented demo accounts on a demo installation', async () => {
    fakeServer();
    await signInPage();
    expect(await screen.findByText('designer@brackenfold.example')).toBeInTheDocument();
    expect(screen.getAllByText('invented demo data').length).toBeGreaterThan(0);
    expect(screen.queryByRole('link', { name: 'Create an account' })).not.toBeInTheDocument();
  });

  it('finishes a sign-up from the mailed link with the password, then opens the home page', async () => {
    const api = installFakeApi({
      'GET /api/config': { body: demoConfig },
      'POST /api/auth/confirm': ({ body }) =>
        (body as { password: string }).password === 'long-enough-password'
          ? { body: { accessToken: 'token-confirmed', user: designer } }
          : errorBody(401, 'INVALID_CREDENTIALS', 'The e-mail or the password is wrong.'),
      'GET /api/auth/me': { body: designer },
    });
    const { user, router } = renderApp('/sign-in?confirm=link-token');
    const form = await screen.findByRole('form', { name: 'Confirm your account' });
    await user.type(within(form).getByLabelText(/Password/), 'a-wrong-password');
    await user.click(within(form).getByRole('button', { name: 'Confirm and sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('The e-mail or the password is wrong.');
    await user.clear(within(form).getByLabelText(/Password/));
    await user.type(within(form).getByLabelText(/Password/), 'long-enough-password');
    await user.click(within(form).getByRole('button', { name: 'Confirm and sign in' }));
    expect(await screen.findByRole('heading', { name: `Welcome, ${designer.displayName}` })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/');
    expect(api.to('POST /api/auth/confirm').at(-1)?.body).toEqual({ token: 'link-token', password: 'long-enough-password' });
    expect(window.localStorage.getItem(AUTH_TOKEN_STORAGE_KEY)).toBe('token-confirmed');
  });
});
