import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { UserEntity } from '../src/users/user.entity.js';
import { createTestApp, type TestApp } from './helpers/test-app.js';

const account = (name: string) => ({ email: `${name}@fenwick.example`, displayName: name, password: 'long-enough-pass' });

describe('SEED_DEMO=false and SIGNUP_ENABLED=true: an empty database', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ seed: false, env: { SIGNUP_ENABLED: 'true' } });
  });
  afterAll(() => t.close());

  it('starts with no account and makes the first registered account admin, the next a member', async () => {
    expect(await t.dataSource.getRepository(UserEntity).count()).toBe(0);
    const config = await t.http().get('/api/config').expect(200);
    expect(config.body).toMatchObject({ demo: false, signupEnabled: true });
    const first = await t.register(account('first'));
    const second = await t.register(account('second'));
    expect(first.user.role).toBe('admin');
    expect(second.user.role).toBe('member');
    await t.http().post('/api/auth/login').send({ email: DEMO_ACCOUNTS.designer.email, password: 'wrenmoss-demo' }).expect(401);
  });
});

describe('SEED_DEMO=false without SIGNUP_ENABLED: a team\'s server', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ seed: false });
  });
  afterAll(() => t.close());

  it('lets the first account in, then keeps sign-up closed by default', async () => {
    expect((await t.register(account('admin-first'))).user.role).toBe('admin');
    const refused = await t.http().post('/api/auth/register').send(account('walk-in')).expect(403);
    expect(refused.body.code).toBe('SIGNUP_DISABLED');
    expect((await t.http().get('/api/config').expect(200)).body).toMatchObject({ demo: false, signupEnabled: false });
  });
});

describe('SIGNUP_ENABLED=false', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ env: { SIGNUP_ENABLED: 'false' } });
  });
  afterAll(() => t.close());

  it('refuses registration with 403 SIGNUP_DISABLED and stores nothing', async () => {
    const response = await t.http().post('/api/auth/register').send(account('refused')).expect(403);
    expect(response.body).toEqual({ statusCode: 403, code: 'SIGNUP_DISABLED', message: expect.any(String) });
    expect(await t.dataSource.getRepository(UserEntity).countBy({ email: 'refused@fenwick.example' })).toBe(0);
    expect((await t.http().get('/api/config').expect(200)).body.signupEnabled).toBe(false);
  });
});

describe('SIGNUP_ENABLED=false and SEED_DEMO=false', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ seed: false, env: { SIGNUP_ENABLED: 'false' } });
  });
  afterAll(() => t.close());

  it('still lets the very first account register (it becomes admin), then closes sign-up', async () => {
    expect((await t.http().get('/api/config').expect(200)).body.signupEnabled).toBe(true);
    expect((await t.register(account('founder'))).user.role).toBe('admin');
    await t.http().post('/api/auth/register').send(account('latecomer')).expect(403);
    expect((await t.http().get('/api/config').expect(200)).body.signupEnabled).toBe(false);
  });
});
