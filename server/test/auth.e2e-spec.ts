import { apiErrorBodySchema, authResponseSchema, userSchema } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../src/seed/demo-accounts.js';
import { UserEntity } from '../src/users/user.entity.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('sign-in over HTTP', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('registers an account as a member and signs it in at once', async () => {
    const response = await t
      .http()
      .post('/api/auth/register')
      .send({ email: '  Nia.Okafor@Marsh.example ', displayName: 'Nia Okafor', password: 'heron-lake-42' })
      .expect(201);
    const body = authResponseSchema.parse(response.body);
    expect(body.user).toMatchObject({ email: 'nia.okafor@marsh.example', displayName: 'Nia Okafor', role: 'member', disabled: false });
    const me = await t.http().get('/api/auth/me').set(bearer(body.accessToken)).expect(200);
    expect(me.body.id).toBe(body.user.id);
  });

  it('refuses a second account with the same e-mail in another case, naming the field', async () => {
    const response = await t
      .http()
      .post('/api/auth/register')
      .send({ email: 'NIA.OKAFOR@marsh.example', displayName: 'Someone Else', password: 'another-pass-1' })
      .expect(409);
    expect(response.body).toEqual({ statusCode: 409, code: 'EMAIL_TAKEN', message: expect.any(String), field: 'email' });
  });

  it('refuses a short password at registration, naming the field', async () => {
    const response = await t
      .http()
      .post('/api/auth/register')
      .send({ email: 'short@marsh.example', displayName: 'Short', password: 'abc' })
      .expect(400);
    expect(response.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'password' });
    expect(await t.dataSource.getRepository(UserEntity).countBy({ email: 'short@marsh.example' })).toBe(0);
  });

  it('signs in a demo account with any capitalisation of its e-mail and returns the user without the hash', async () => {
    const response = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'Designer@Brackenfold.EXAMPLE', password: DEMO_PASSWORD })
      .expect(200);
    const body = authResponseSchema.parse(response.body);
    expect(body.user.email).toBe(DEMO_ACCOUNTS.designer.email);
    expect(Object.keys(response.body.user).sort()).toEqual(Object.keys(userSchema.shape).sort());
    expect(JSON.stringify(response.body)).not.toMatch(/\$2[aby]\$/);
  });

  it('GET /api/auth/me returns the signed-in user', async () => {
    const token = await t.loginAs(DEMO_ACCOUNTS.reviewer.email);
    const response = await t.http().get('/api/auth/me').set(bearer(token)).expect(200);
    expect(userSchema.parse(response.body)).toMatchObject({ email: DEMO_ACCOUNTS.reviewer.email, role: 'member' });
  });

  it('GET /api/auth/me without a token, or with a forged one, answers 401 UNAUTHENTICATED', async () => {
    const missing = await t.http().get('/api/auth/me').expect(401);
    expect(missing.body).toEqual({ statusCode: 401, code: 'UNAUTHENTICATED', message: expect.any(String) });
    const token = await t.loginAs(DEMO_ACCOUNTS.viewer.email);
    const [header, payload] = token.split('.');
    const forged = `${header}.${payload}.${'A'.repeat(43)}`;
    const response = await t.http().get('/api/auth/me').set(bearer(forged)).expect(401);
    expect(response.body.code).toBe('UNAUTHENTICATED');
  });

  it('answers a wrong password and an unknown e-mail with the same 401 body', async () => {
    const wrongPassword = await t
      .http()
      .post('/api/auth/login')
      .send({ email: DEMO_ACCOUNTS.admin.email, password: 'not-the-password' })
      .expect(401);
    const unknownEmail = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'nobody@brackenfold.example', password: 'not-the-password' })
      .expect(401);
    expect(apiErrorBodySchema.parse(wrongPassword.body)).toEqual(unknownEmail.body);
    expect(wrongPassword.body.code).toBe('INVALID_CREDENTIALS');
  });

  it('names the missing field when the e-mail is left out', async () => {
    const response = await t.http().post('/api/auth/login').send({ password: 'whatever' }).expect(400);
    expect(response.body).toMatchObject({ statusCode: 400, code: 'VALIDATION_FAILED', field: 'email', message: 'E-mail is required' });
    expect(response.body.problems).toEqual([{ field: 'email', message: 'E-mail is required' }]);
  });

  it('answers a body that is not JSON with 400 and the error body', async () => {
    const response = await t
      .http()
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email": ')
      .expect(400);
    expect(apiErrorBodySchema.parse(response.body).code).toBe('VALIDATION_FAILED');
  });

  it('a disabled user cannot sign in and the token they already hold stops working', async () => {
    const { accessToken, user } = await t.register({ email: 'leaving@marsh.example', displayName: 'Leaving Soon', password: 'leaving-soon-1' });
    await t.http().get('/api/auth/me').set(bearer(accessToken)).expect(200);

    const adminToken = await t.loginAs(DEMO_ACCOUNTS.admin.email);
    await t.http().patch(`/api/users/${user.id}`).set(bearer(adminToken)).send({ disabled: true }).expect(200);

    const me = await t.http().get('/api/auth/me').set(bearer(accessToken)).expect(401);
    expect(me.body.code).toBe('ACCOUNT_DISABLED');
    const login = await t.http().post('/api/auth/login').send({ email: 'leaving@marsh.example', password: 'leaving-soon-1' }).expect(401);
    expect(login.body.code).toBe('ACCOUNT_DISABLED');

    await t.http().patch(`/api/users/${user.id}`).set(bearer(adminToken)).send({ disabled: false }).expect(200);
    await t.http().get('/api/auth/me').set(bearer(accessToken)).expect(200);
  });

  it('throttles sign-in per e-mail: ten attempts in a minute are answered, the eleventh gets 429', async () => {
    const email = 'Throttled@Brackenfold.example';
    for (let attempt = 1; attempt <= 10; attempt += 1) {
      const casing = attempt % 2 === 0 ? email.toLowerCase() : email;
      await t.http().post('/api/auth/login').send({ email: casing, password: 'wrong-password' }).expect(401);
    }
    const eleventh = await t.http().post('/api/auth/login').send({ email, password: 'wrong-password' }).expect(429);
    expect(eleventh.body).toEqual({ statusCode: 429, code: 'TOO_MANY_REQUESTS', message: expect.any(String) });

    // Another e-mail is counted on its own.
    await t.http().post('/api/auth/login').send({ email: DEMO_ACCOUNTS.viewer.email, password: DEMO_PASSWORD }).expect(200);
  });
});
