import crypto, { type ScryptOptions } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { createTestModule, type TestModule } from '../../test/helpers/test-modules.js';
import { UsersService } from '../users/users.service.js';
import { AuthModule } from './auth.module.js';
import { AuthService } from './auth.service.js';
import { SCRYPT_PARAMS } from './password-hasher.js';

const ADDRESS = '192.0.2.10';

describe('AuthService', () => {
  let t: TestModule;
  let auth: AuthService;
  let users: UsersService;

  beforeAll(async () => {
    t = await createTestModule([AuthModule], { SIGNUP_ENABLED: 'false' });
    auth = t.module.get(AuthService);
    users = t.module.get(UsersService);
  });
  afterAll(() => t.close());
  afterEach(() => jest.restoreAllMocks());

  it('lets the first account register while sign-up is disabled, then refuses the next', async () => {
    expect(await auth.isSignupOpen()).toBe(true);
    const first = await auth.register({ email: 'founder@fenwick.example', displayName: 'Founder', password: 'founder-pass-1' }, ADDRESS);
    expect(first.status === 'signed-in' && first.user.role).toBe('admin');
    expect(await auth.isSignupOpen()).toBe(false);
    await expect(
      auth.register({ email: 'second@fenwick.example', displayName: 'Second', password: 'second-pass-1' }, ADDRESS),
    ).rejects.toMatchObject({ code: 'SIGNUP_DISABLED', status: 403 });
  });

  it('stores a self-describing scrypt hash (PHC string format) with its parameters and salt, never the password itself', async () => {
    const founder = (await users.findByEmail('founder@fenwick.example'))!;
    expect(founder.passwordHash).toMatch(new RegExp(`^\\$scrypt\\$ln=${SCRYPT_PARAMS.ln},r=${SCRYPT_PARAMS.r},p=${SCRYPT_PARAMS.p}\\$[A-Za-z0-9+/]{22}\\$[A-Za-z0-9+/]{43}$`));
    expect(founder.passwordHash).not.toContain('founder-pass-1');
    await expect(auth.login({ email: 'founder@fenwick.example', password: 'founder-pass-1' }, ADDRESS)).resolves.toMatchObject({ user: { email: 'founder@fenwick.example' } });
  });

  it('spends one scrypt on an unknown e-mail, as on a known one, and answers alike', async () => {
    const scrypt = jest.spyOn(crypto, 'scrypt');
    const unknown = auth.login({ email: 'nobody@fenwick.example', password: 'whatever-it-is' }, ADDRESS);
    await expect(unknown).rejects.toMatchObject({ code: 'INVALID_CREDENTIALS', status: 401 });
    expect(scrypt).toHaveBeenCalledTimes(1);
    const wrong = auth.login({ email: 'founder@fenwick.example', password: 'whatever-it-is' }, ADDRESS);
    await expect(wrong).rejects.toMatchObject({ code: 'INVALID_CREDENTIALS', status: 401 });
    expect(scrypt).toHaveBeenCalledTimes(2);
    expect(scrypt.mock.calls.map((call) => (call[3] as ScryptOptions).N)).toEqual([2 ** SCRYPT_PARAMS.ln, 2 ** SCRYPT_PARAMS.ln]);
  });

  it('still accepts a bcrypt hash from before scrypt, and replaces it with scrypt on that sign-in', async () => {
    const legacy = await users.createAccount({ email: 'legacy@fenwick.example', displayName: 'Legacy', passwordHash: await bcrypt.hash('legacy-pass-1', 4), emailConfirmed: true });
    await expect(auth.login({ email: 'legacy@fenwick.example', password: 'not-the-password' }, ADDRESS)).rejects.toMatchObject({ code: 'INVALID_CREDENTIALS' });
    expect((await users.findById(legacy.id))!.passwordHash).toMatch(/^\$2[aby]\$/);
    await auth.login({ email: 'legacy@fenwick.example', password: 'legacy-pass-1' }, ADDRESS);
    expect((await users.findById(legacy.id))!.passwordHash).toMatch(/^\$scrypt\$/);
    await expect(auth.login({ email: 'legacy@fenwick.example', password: 'legacy-pass-1' }, ADDRESS)).resolves.toMatchObject({ user: { id: legacy.id } });
  });

  it('refuses an account that has not confirmed its address as if it did not exist', async () => {
    await users.createAccount({ email: 'pending@fenwick.example', displayName: 'Pending', passwordHash: (await users.findByEmail('founder@fenwick.example'))!.passwordHash });
    await expect(auth.login({ email: 'pending@fenwick.example', password: 'founder-pass-1' }, ADDRESS)).rejects.toMatchObject({ code: 'INVALID_CREDENTIALS', status: 401 });
  });
});
