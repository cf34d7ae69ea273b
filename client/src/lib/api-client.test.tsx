import { MantineProvider } from '@mantine/core';
import { Notifications } from '@mantine/notifications';
import { render, screen } from '@testing-library/react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { errorBody, installFakeApi } from '../test/fake-api';
import { apiRequest } from './api-client';
import { ApiError } from './api-error';
import { getAuthToken, setAuthToken } from './session/auth-token';

function renderNotifications() {
  render(
    <MantineProvider env="test">
      <Notifications />
    </MantineProvider>,
  );
}

async function rejectionOf(promise: Promise<unknown>): Promise<ApiError> {
  const error = await promise.then(
    () => null,
    (reason: unknown) => reason,
  );
  if (!(error instanceof ApiError)) throw new Error(`expected an ApiError, got ${String(error)}`);
  return error;
}

describe('the API client', () => {
  beforeEach(() => renderNotifications());

  it('sends the stored token as a bearer token and JSON bodies with their content type', async () => {
    const api = installFakeApi({ 'PATCH /api/users/u-7': { body: { ok: true } } });
    setAuthToken('token-abc');

    const answer = await apiRequest('/users/u-7', { method: 'PATCH', body: { disabled: true } });

    expect(answer).toEqual({ ok: true });
    const [request] = api.requests;
    expect(request?.headers.get('Authorization')).toBe('Bearer token-abc');
    expect(request?.headers.get('Content-Type')).toBe('application/json');
    expect(request?.body).toEqual({ disabled: true });
  });

  it('leaves the token off anonymous requests', async () => {
    const api = installFakeApi({ 'GET /api/config': { body: {} } });
    setAuthToken('token-abc');
    await apiRequest('/config', { anonymous: true });
    expect(api.requests[0]?.headers.has('Authorization')).toBe(false);
  });

  it("turns the server's error body into an ApiError and a notification naming the field", async () => {
    installFakeApi({ 'POST /api/things': errorBody(400, 'VALIDATION_FAILED', 'Length must be positive.', 'targets.l') });

    const error = await rejectionOf(apiRequest('/things', { method: 'POST', body: {} }));

    expect(error).toMatchObject({ status: 400, code: 'VALIDATION_FAILED', field: 'targets.l', message: 'Length must be positive.' });
    expect(await screen.findByText('Check your input')).toBeInTheDocument();
    expect(screen.getByText(/Length must be positive\./)).toHaveTextContent('Field: targets.l');
  });

  it('lists the problems of a refused upload by row and field', async () => {
    installFakeApi({
      'POST /api/uploads': {
        status: 400,
        body: {
          statusCode: 400,
          code: 'VALIDATION_FAILED',
          message: 'The file was refused.',
          problems: [{ row: 3, field: 'kp', message: 'kp cannot be given in V' }],
        },
      },
    });
    await rejectionOf(apiRequest('/uploads', { method: 'POST' }));
    expect(await screen.findByText(/The file was refused\./)).toHaveTextContent('row 3, kp: kp cannot be given in V');
  });

  it('ends the session when the server rejects the token', async () => {
    installFakeApi({ 'GET /api/auth/me': errorBody(401, 'UNAUTHENTICATED', 'Your session has expired.') });
    setAuthToken('token-expired');

    const error = await rejectionOf(apiRequest('/auth/me'));

    expect(error.status).toBe(401);
    expect(getAuthToken()).toBeNull();
    expect(await screen.findByText('Signed out')).toBeInTheDocument();
  });

  it('keeps the session when a request without a token is refused (a wrong password)', async () => {
    installFakeApi({ 'POST /api/auth/login': errorBody(401, 'INVALID_CREDENTIALS', 'Wrong e-mail or password.') });
    setAuthToken('token-of-someone-else');
    await rejectionOf(apiRequest('/auth/login', { method: 'POST', anonymous: true, quiet: true }));
    expect(getAuthToken()).toBe('token-of-someone-else');
    expect(screen.queryByText('Wrong e-mail or password.')).not.toBeInTheDocument();
  });

  it('stands in for a failure without an error body', async () => {
    installFakeApi({ 'GET /api/broken': { status: 502 } });
    const error = await rejectionOf(apiRequest('/broken'));
    expect(error).toMatchObject({ status: 502, code: 'UNEXPECTED_RESPONSE' });
    expect(await screen.findByText('Server error')).toBeInTheDocument();
  });

  it('refuses an answer that does not match the expected schema', async () => {
    installFakeApi({ 'GET /api/config': { body: { signupEnabled: 'yes' } } });
    const schema = z.object({ signupEnabled: z.boolean() });
    const error = await rejectionOf(apiRequest('/config', { schema }));
    expect(error.code).toBe('UNEXPECTED_RESPONSE');
  });
});

describe('the API client reading a download', () => {
  it('answers the text as it came, and still reads a refusal as the JSON error body', async () => {
    const csv = 'key,value\r\nformat,channelwright-sheet\r\n';
    vi.stubGlobal('fetch', vi.fn(async () => new Response(csv, { status: 200, headers: { 'Content-Type': 'text/csv' } })));
    expect(await apiRequest('/sheets/s-1/export?format=csv', { responseType: 'text' })).toBe(csv);

    installFakeApi({ 'GET /api/sheets/s-1/export': errorBody(404, 'SHEET_NOT_FOUND', 'There is no sheet with this id') });
    const error = await rejectionOf(apiRequest('/sheets/s-1/export', { responseType: 'text', quiet: true }));
    expect(error.code).toBe('SHEET_NOT_FOUND');
    expect(error.message).toBe('There is no sheet with this id');
  });
});
