import { apiErrorBodySchema, authResponseSchema, registerResponseSchema, userSchema } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../src/seed/demo-accounts.js';
import { UserEntity } from '../src/users/user.entity.js';
import { receivedMail } from './helpers/mail.js';
import { bearer, confirmationToken, createTestApp, type TestApp } from './helpers/test-app.js';

describe('sign-in over HTTP', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('registers an account as a member, which signs in once its owner follows the mailed link with the password', async () => {
    const response = await t
      .http()
      .post('/api/auth/register')
      .send({ email: '  Nia.Okafor@Marsh.example ', displayName: 'Nia Okafor', password: 'heron-lake-42' })
      .expect(202);
    expect(registerResponseSchema.parse(response.body)).toEqual({ status: 'confirmation-sent', email: 'nia.okafor@marsh.example' });
    await t.http().post('/api/auth/login').send({ email: 'nia.okafor@marsh.example', password: 'heron-lake-42' }).expect(401);
    const token = await confirmationToken(t.app, 'nia.okafor@marsh.example');
    await t.http().post('/api/auth/confirm').send({ token, password: 'not-her-password' }).expect(401);
    const confirmed = await t.http().post('/api/auth/confirm').send({ token, password: 'heron-lake-42' }).expect(200);
    const body = authResponseSchema.parse(confirmed.body);
    expect(body.user).toMatchObject({ email: 'nia.okafor@marsh.example', displayName: 'Nia Okafor', role: 'member', disabled: false, libraryAccess: false });
    const me = await t.http().get('/api/auth/me').set(bearer(body.accessToken)).expect(200);
    expect(me.body.id).toBe(body.user.id);
    await t.http().post('/api/auth/login').send({ email: 'nia.okafor@marsh.example', password: 'heron-lake-42' }).expect(200);
  });

  it('answers a sign-up with a taken e-mail (in another case) exactly like a new one, changes nothing and mails the owner instead', async () => {
    const taken = await t.http().post('/api/auth/register').send({ email: 'NIA.OKAFOR@marsh.example', displayName: 'Someone Else', password: 'another-pass-1' }).expect(202);
    const fresh = await t.http().post('/api/auth/register').send({ email: 'fresh.face@marsh.example', displayName: 'Fresh Face', password: 'another-pass-1' }).expect(202);
    expect(Object.keys(taken.body).sort()).toEqual(Object.keys(fresh.body).sort());
    expect(taken.body).toEqual({ status: 'confirmation-sent', email: 'nia.okafor@marsh.example' });
    const [notice] = await receivedMail(t, 'nia.okafor@marsh.example');
    expect(notice.subject).toBe('Someone tried to sign up with your address');
    expect(notice.text).not.toMatch(/confirm=/);
    const stored = await t.dataSource.getRepository(UserEntity).findOneByOrFail({ email: 'nia.okafor@marsh.example' });
    expect(stored.displayName).toBe('Nia Okafor');
    await t.http().post('/api/auth/login').send({ email: 'nia.okafor@marsh.example', password: 'heron-lake-42' }).expect(200);
  });

  it('refuses a confirmation link that is not one, naming the field', async () => {
    const accessToken = await t.loginAs(DEMO_ACCOUNTS.viewer.email);
    const response = await t.http().post('/api/auth/confirm').send({ token: accessToken, password: DEMO_PASSWORD }).expect(400);
    expect(response.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'token' });
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

  it('applies a role change to the very next request of a token already in use (the account read is reused only until a change)', async () => {
    const { accessToken, user } = await t.register({ email: 'promoted@marsh.example', displayName: 'Promoted Soon', password: 'promoted-soon-1' });
    await t.http().get('/api/users').set(bearer(accessToken)).expect(403);
    const adminToken = await t.loginAs(DEMO_ACCOUNTS.admin.email);
    await t.http().patch(`/api/users/${user.id}`).set(bearer(adminToken)).send({ role: 'admin' }).expect(200);
    await t.http().get('/api/users').set(bearer(accessToken)).expect(200);
    await t.http().patch(`/api/users/${user.id}`).set(bearer(adminToken)).send({ role: 'member' }).expect(200);
    await t.http().get('/api/users').set(bearer(accessToken)).expect(403);
  });

});

describe('sign-in limits, behind a proxy that names the client address', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ env: { TRUST_PROXY: '1' } });
  });
  afterAll(() => t.close());
  const from = (address: string) => ({ 'X-Forwarded-For': address });

  it('blocks an address after ten failed sign-ins, yet lets the owner in from elsewhere with the right password', async () => {
    const owner = DEMO_ACCOUNTS.reviewer.email;
    for (let attempt = 1; attempt <= 10; attempt += 1) {
      const casing = attempt % 2 === 0 ? owner.toUpperCase() : owner;
      await t.http().post('/api/auth/login').set(from('203.0.113.7')).send({ email: casing, password: 'wrong-password' }).expect(401);
    }
    const eleventh = await t.http().post('/api/auth/login').set(from('203.0.113.7')).send({ email: owner, password: DEMO_PASSWORD }).expect(429);
    expect(eleventh.body).toEqual({ statusCode: 429, code: 'TOO_MANY_REQUESTS', message: expect.any(String) });
    expect(Number(eleventh.headers['retry-after'])).toBeGreaterThan(0);

    // The account was only slowed down: its owner, elsewhere, signs in.
    await t.http().post('/api/auth/login').set(from('198.51.100.2')).send({ email: owner, password: DEMO_PASSWORD }).expect(200);
  });

  it('counts failures, not sign-ins: an address signing in correctly is never blocked', async () => {
    for (let attempt = 1; attempt <= 12; attempt += 1) {
      await t.http().post('/api/auth/login').set(from('198.51.100.9')).send({ email: DEMO_ACCOUNTS.viewer.email, password: DEMO_PASSWORD }).expect(200);
    }
  });

  it('limits sign-ups per address: ten an hour are answered, the eleventh gets 429', async () => {
    for (let attempt = 1; attempt <= 10; attempt += 1) {
      await t.http().post('/api/auth/register').set(from('192.0.2.55')).send({ email: `visitor${attempt}@marsh.example`, displayName: 'Visitor', password: 'visitor-pass-1' }).expect(202);
    }
    const eleventh = await t.http().post('/api/auth/register').set(from('192.0.2.55')).send({ email: 'visitor11@marsh.example', displayName: 'Visitor', password: 'visitor-pass-1' }).expect(429);
    expect(eleventh.body.code).toBe('TOO_MANY_REQUESTS');
    await t.http().post('/api/auth/register').set(from('192.0.2.56')).send({ email: 'visitor12@marsh.example', displayName: 'Visitor', password: 'visitor-pass-1' }).expect(202);
  });
});
