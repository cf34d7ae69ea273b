import { userSchema } from '@channelwright/shared/schemas';
import { z } from 'zod';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { UserEntity } from '../src/users/user.entity.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('users admin over HTTP', () => {
  let t: TestApp;
  let adminToken: string;
  let memberToken: string;
  const idOf = async (email: string) => (await t.dataSource.getRepository(UserEntity).findOneByOrFail({ email })).id;

  beforeAll(async () => {
    t = await createTestApp();
    adminToken = await t.loginAs(DEMO_ACCOUNTS.admin.email);
    memberToken = await t.loginAs(DEMO_ACCOUNTS.designer.email);
  });
  afterAll(() => t.close());

  it('lists the seeded demo accounts to an admin, in the shared user shape and without hashes', async () => {
    const response = await t.http().get('/api/users').set(bearer(adminToken)).expect(200);
    const users = z.array(userSchema.strict()).parse(response.body);
    expect(users.map((u) => u.email)).toEqual(Object.values(DEMO_ACCOUNTS).map((a) => a.email).sort());
    expect(users.find((u) => u.email === DEMO_ACCOUNTS.admin.email)).toMatchObject({ role: 'admin', processMaintainer: true });
    expect(users.find((u) => u.email === DEMO_ACCOUNTS.reviewer.email)).toMatchObject({ role: 'member', processMaintainer: false });
  });

  it('answers 403 FORBIDDEN to a member on GET and PATCH /api/users', async () => {
    const list = await t.http().get('/api/users').set(bearer(memberToken)).expect(403);
    expect(list.body).toEqual({ statusCode: 403, code: 'FORBIDDEN', message: expect.any(String) });
    const viewerId = await idOf(DEMO_ACCOUNTS.viewer.email);
    await t.http().patch(`/api/users/${viewerId}`).set(bearer(memberToken)).send({ role: 'admin' }).expect(403);
    expect((await t.dataSource.getRepository(UserEntity).findOneByOrFail({ id: viewerId })).role).toBe('member');
  });

  it('answers 401 to /api/users without a token', async () => {
    await t.http().get('/api/users').expect(401);
  });

  it('lets an admin mark a process maintainer and promote a member', async () => {
    const reviewerId = await idOf(DEMO_ACCOUNTS.reviewer.email);
    const marked = await t.http().patch(`/api/users/${reviewerId}`).set(bearer(adminToken)).send({ processMaintainer: true }).expect(200);
    expect(userSchema.parse(marked.body)).toMatchObject({ id: reviewerId, processMaintainer: true, role: 'member' });
    const promoted = await t.http().patch(`/api/users/${reviewerId}`).set(bearer(adminToken)).send({ role: 'admin' }).expect(200);
    expect(promoted.body).toMatchObject({ role: 'admin', processMaintainer: true });
    // The promoted user can now use admin routes with the token they already had.
    const reviewerToken = await t.loginAs(DEMO_ACCOUNTS.reviewer.email);
    await t.http().get('/api/users').set(bearer(reviewerToken)).expect(200);
    await t.http().patch(`/api/users/${reviewerId}`).set(bearer(adminToken)).send({ role: 'member', processMaintainer: false }).expect(200);
    await t.http().get('/api/users').set(bearer(reviewerToken)).expect(403);
  });

  it('refuses to let the last admin demote or disable themself (409), and changes nothing', async () => {
    const adminId = await idOf(DEMO_ACCOUNTS.admin.email);
    const demote = await t.http().patch(`/api/users/${adminId}`).set(bearer(adminToken)).send({ role: 'member' }).expect(409);
    expect(demote.body).toMatchObject({ statusCode: 409, code: 'LAST_ADMIN', field: 'role' });
    const disable = await t.http().patch(`/api/users/${adminId}`).set(bearer(adminToken)).send({ disabled: true }).expect(409);
    expect(disable.body).toMatchObject({ code: 'LAST_ADMIN', field: 'disabled' });
    const stored = await t.dataSource.getRepository(UserEntity).findOneByOrFail({ id: adminId });
    expect(stored).toMatchObject({ role: 'admin', disabled: false });
  });

  it('refuses an unknown field or an empty change with 400, and an unknown user with 404', async () => {
    const viewerId = await idOf(DEMO_ACCOUNTS.viewer.email);
    const unknownField = await t.http().patch(`/api/users/${viewerId}`).set(bearer(adminToken)).send({ email: 'x@y.example' }).expect(400);
    expect(unknownField.body.code).toBe('VALIDATION_FAILED');
    const badRole = await t.http().patch(`/api/users/${viewerId}`).set(bearer(adminToken)).send({ role: 'owner' }).expect(400);
    expect(badRole.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'role' });
    await t.http().patch(`/api/users/${viewerId}`).set(bearer(adminToken)).send({}).expect(400);
    const missing = await t
      .http()
      .patch('/api/users/00000000-0000-4000-8000-000000000000')
      .set(bearer(adminToken))
      .send({ disabled: true })
      .expect(404);
    expect(missing.body).toEqual({ statusCode: 404, code: 'USER_NOT_FOUND', message: expect.any(String) });
  });
});
