import { createApp } from '../src/app.factory.js';
import { ConfigError } from '../src/config/config-error.js';
import { createTestEnv, type TestEnv } from './helpers/test-env.js';

describe('start-up configuration', () => {
  let testEnv: TestEnv;
  beforeEach(async () => {
    testEnv = await createTestEnv();
  });
  afterEach(() => testEnv.remove());

  const startWith = (overrides: Record<string, string | undefined>) =>
    createApp({ env: { ...testEnv.env, ...overrides }, logger: false });

  it('refuses to start in production with a JWT secret shorter than 32 characters, naming JWT_SECRET', async () => {
    const start = startWith({ NODE_ENV: 'production', JWT_SECRET: 'only-twenty-characters', SEED_DEMO: 'false' });
    await expect(start).rejects.toThrow(ConfigError);
    await expect(start).rejects.toMatchObject({ variable: 'JWT_SECRET' });
  });

  it('refuses to start in production without any JWT secret', async () => {
    await expect(startWith({ NODE_ENV: 'production', JWT_SECRET: undefined, SEED_DEMO: 'false' })).rejects.toMatchObject({
      variable: 'JWT_SECRET',
    });
  });

  it('refuses to seed the demo accounts (and their published password) in production', async () => {
    const start = startWith({ NODE_ENV: 'production', JWT_SECRET: 'a-real-production-secret-of-40-characters', SEED_DEMO: 'true' });
    await expect(start).rejects.toMatchObject({ variable: 'SEED_DEMO' });
  });

  it('names a bad variable and what is wrong with it', async () => {
    await expect(startWith({ PORT: 'eighty' })).rejects.toThrow(/PORT: must be a whole number/);
    await expect(startWith({ JWT_TTL: 'forever' })).rejects.toThrow(/JWT_TTL: must be a duration/);
    await expect(startWith({ SIGNUP_ENABLED: 'maybe' })).rejects.toThrow(/SIGNUP_ENABLED: must be true or false/);
  });
});
