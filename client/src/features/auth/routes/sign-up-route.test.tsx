import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { getAuthToken } from '../../../lib/session/auth-token';
import { errorBody, installFakeApi } from '../../../test/fake-api';
import { demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';

const openConfig = { ...demoConfig, signupEnabled: true };

async function fillSignUp(user: ReturnType<typeof renderApp>['user'], password: string) {
  await user.type(await screen.findByLabelText(/Display name/), 'Ines Marlow');
  await user.type(screen.getByLabelText(/E-mail/), designer.email);
  await user.type(screen.getByLabelText(/Password/), password);
  await user.click(screen.getByRole('button', { name: 'Create account' }));
}

describe('the sign-up page', () => {
  it('says so when sign-up is turned off, and shows no form', async () => {
    installFakeApi({ 'GET /api/config': { body: demoConfig } });
    renderApp('/sign-up');
    expect(await screen.findByText('Sign-up is turned off')).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Create an account' })).not.toBeInTheDocument();
  });

  it('asks for a password of at least ten characters before sending anything', async () => {
    const api = installFakeApi({ 'GET /api/config': { body: openConfig } });
    const { user } = renderApp('/sign-up');
    await fillSignUp(user, 'short');
    expect(await screen.findByText('Password must have at least 10 characters')).toBeInTheDocument();
    expect(api.to('POST /api/auth/register')).toHaveLength(0);
  });

  it('puts a refusal that names a field on that field', async () => {
    installFakeApi({
      'GET /api/config': { body: openConfig },
      'POST /api/auth/register': errorBody(409, 'EMAIL_TAKEN', 'An account with this e-mail exists.', 'email'),
    });
    const { user } = renderApp('/sign-up');
    await fillSignUp(user, 'long-enough-password');
    expect(await screen.findByRole('alert')).toHaveTextContent('An account with this e-mail exists.');
    expect(screen.getByLabelText(/E-mail/)).toHaveAttribute('aria-invalid', 'true');
    expect(getAuthToken()).toBeNull();
  });

  it('creates the first account of a server, signs it in and opens the home page', async () => {
    const api = installFakeApi({
      'GET /api/config': { body: openConfig },
      'POST /api/auth/register': { status: 201, body: { status: 'signed-in', accessToken: 'token-new', user: designer } },
      'GET /api/auth/me': { body: designer },
    });
    const { user, router } = renderApp('/sign-up');
    await fillSignUp(user, 'long-enough-password');
    expect(await screen.findByRole('heading', { name: `Welcome, ${designer.displayName}` })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/');
    expect(api.to('POST /api/auth/register')[0]?.body).toEqual({
      displayName: 'Ines Marlow',
      email: designer.email,
      password: 'long-enough-password',
    });
    expect(getAuthToken()).toBe('token-new');
  });

  it('tells a later sign-up to follow the link mailed to the address, and signs nobody in', async () => {
    installFakeApi({
      'GET /api/config': { body: openConfig },
      'POST /api/auth/register': { status: 202, body: { status: 'confirmation-sent', email: designer.email } },
    });
    const { user } = renderApp('/sign-up');
    await fillSignUp(user, 'long-enough-password');
    const notice = await screen.findByRole('status');
    expect(notice).toHaveTextContent('Check your mail');
    expect(notice).toHaveTextContent(`We sent a message to ${designer.email}`);
    expect(screen.queryByRole('form', { name: 'Create an account' })).not.toBeInTheDocument();
    expect(getAuthToken()).toBeNull();
  });
});
