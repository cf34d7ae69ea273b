import { DataSource } from 'typeorm';
import { createTestModule, type TestModule } from '../../test/helpers/test-modules.js';
import { DomainError } from '../common/errors/domain-error.js';
import { UserEntity } from './user.entity.js';
import { UsersModule } from './users.module.js';
import { UsersService } from './users.service.js';

const account = (email: string) => ({ email, displayName: email.split('@')[0], passwordHash: 'not-a-real-hash' });

describe('UsersService', () => {
  let t: TestModule;
  let users: UsersService;

  beforeEach(async () => {
    t = await createTestModule([UsersModule]);
    users = t.module.get(UsersService);
  });
  afterEach(() => t.close());

  it('makes the first account ever created admin and every later one a member', async () => {
    expect((await users.createAccount(account('one@fenwick.example'))).role).toBe('admin');
    expect((await users.createAccount(account('two@fenwick.example'))).role).toBe('member');
  });

  it('gives exactly one admin when several accounts are created at the same moment on an empty database', async () => {
    const created = await Promise.all(['a', 'b', 'c', 'd'].map((name) => users.createAccount(account(`${name}@fenwick.example`))));
    expect(created.filter((u) => u.role === 'admin')).toHaveLength(1);
    expect(await t.module.get(DataSource).getRepository(UserEntity).count()).toBe(4);
  });

  it('stores e-mails lower-case and refuses one that differs only in case', async () => {
    const stored = await users.createAccount(account('Mixed.Case@Fenwick.example'));
    expect(stored.email).toBe('mixed.case@fenwick.example');
    expect((await users.findByEmail('MIXED.CASE@fenwick.EXAMPLE'))?.id).toBe(stored.id);
    await expect(users.createAccount(account('mixed.case@FENWICK.example'))).rejects.toMatchObject({
      code: 'EMAIL_TAKEN',
      status: 409,
      field: 'email',
    });
  });

  it('refuses to demote or disable the last enabled admin and leaves the row as it was', async () => {
    const admin = await users.createAccount(account('only-admin@fenwick.example'));
    await expect(users.update(admin.id, { role: 'member' })).rejects.toMatchObject({ code: 'LAST_ADMIN', field: 'role' });
    await expect(users.update(admin.id, { disabled: true })).rejects.toBeInstanceOf(DomainError);
    expect(await users.findById(admin.id)).toMatchObject({ role: 'admin', disabled: false });
  });

  it('lets an admin step down once another enabled admin exists', async () => {
    const first = await users.createAccount(account('first@fenwick.example'));
    const second = await users.createAccount(account('second@fenwick.example'));
    await users.update(second.id, { role: 'admin' });
    expect((await users.update(first.id, { role: 'member' })).role).toBe('member');
    // A disabled admin does not count: the remaining enabled admin cannot be disabled.
    await expect(users.update(second.id, { disabled: true })).rejects.toMatchObject({ code: 'LAST_ADMIN' });
  });

  it('updates only the fields given', async () => {
    await users.createAccount(account('admin@fenwick.example'));
    const member = await users.createAccount(account('member@fenwick.example'));
    const updated = await users.update(member.id, { processMaintainer: true });
    expect(updated).toMatchObject({ role: 'member', disabled: false, processMaintainer: true, email: 'member@fenwick.example' });
  });
});
