import bcrypt from 'bcryptjs';
import { DataSource } from 'typeorm';
import { createTestModule, type TestModule } from '../../test/helpers/test-modules.js';
import { UserEntity } from '../users/user.entity.js';
import { AuthModule } from './auth.module.js';
import { AuthService } from './auth.service.js';

describe('AuthService', () => {
  let t: TestModule;
  let auth: AuthService;

  beforeAll(async () => {
    t = await createTestModule([AuthModule], { SIGNUP_ENABLED: 'false' });
    auth = t.module.get(AuthService);
  });
  afterAll(() => t.close());
  afterEach(() => jest.restoreAllMocks());

  it('lets the first account register while sign-up is disabled, then refuses the next', async () => {
    expect(await auth.isSignupOpen()).toBe(true);
    const first = await auth.register({ email: 'founder@fenwick.example', displayName: 'Founder', password: 'founder-pass-1' });
    expect(first.user.role).toBe('admin');
    expect(await auth.isSignupOpen()).toBe(false);
    await expect(
      auth.register({ email: 'second@fenwick.example', displayName: 'Second', password: 'second-pass-1' }),
    ).rejects.toMatchObject({ code: 'SIGNUP_DISABLED', status: 403 });
  });

  it('stores a bcrypt hash of cost 12, never the password itself', async () => {
    const founder = await t.module.get(DataSource).getRepository(UserEntity).findOneByOrFail({ email: 'founder@fenwick.example' });
    expect(founder.passwordHash).toMatch(/^\$2[aby]\$12\$/);
    expect(founder.passwordHash).not.toContain('founder-pass-1');
    expect(await bcrypt.compare('founder-pass-1', founder.passwordHash)).toBe(true);
  });

  it('spends one bcrypt comparison on an unknown e-mail, as on a known one, and answers alike', async () => {
    const compare = jest.spyOn(bcrypt, 'compare');
    const unknown = auth.login({ email: 'nobody@fenwick.example', password: 'whatever-it-is' });
    await expect(unknown).rejects.toMatchObject({ code: 'INVALID_CREDENTIALS', status: 401 });
    expect(compare).toHaveBeenCalledTimes(1);
    const wrong = auth.login({ email: 'founder@fenwick.example', password: 'whatever-it-is' });
    await expect(wrong).rejects.toMatchObject({ code: 'INVALID_CREDENTIALS', status: 401 });
    expect(compare).toHaveBeenCalledTimes(2);
  });
});
