import type { AuthResponse, RegisterRequest } from '@channelwright/shared/schemas';
import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createApp } from '../../src/app.factory.js';
import type { EnvSource } from '../../src/config/load-config.js';
import { DEMO_PASSWORD } from '../../src/seed/demo-accounts.js';
import { createTestEnv } from './test-env.js';

export interface TestAppOptions {
  /** Seed the invented demo data (default true). */
  seed?: boolean;
  /** More environment variables (SIGNUP_ENABLED, JWT_TTL, …); DATA_DIR is always a fresh temporary folder. */
  env?: EnvSource;
}

export interface TestApp {
  app: NestExpressApplication;
  /** The real SQLite database behind the app, for checks (and deliberate tampering) in tests. */
  dataSource: DataSource;
  dataDir: string;
  /** A supertest client for the app: `t.http().get('/api/health')`. */
  http(): ReturnType<typeof request>;
  /** Signs in and returns the access token; demo accounts need no password. Cached per account. */
  loginAs(email: string, password?: string): Promise<string>;
  /** Registers an account and returns its token and user. */
  register(account: RegisterRequest): Promise<AuthResponse>;
  close(): Promise<void>;
}

/** The real app (real migrations, real SQLite file) on a temporary DATA_DIR of its own. */
export async function createTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const testEnv = createTestEnv({ SEED_DEMO: String(options.seed ?? true), ...options.env });
  let app: NestExpressApplication;
  try {
    app = await createApp({ env: testEnv.env, logger: ['error'] });
  } catch (error) {
    testEnv.remove();
    throw error;
  }
  const http = () => request(app.getHttpServer());
  const tokens = new Map<string, string>();

  return {
    app,
    dataSource: app.get(DataSource),
    dataDir: testEnv.dataDir,
    http,
    // Cached so a test file that signs in often does not run into the sign-in throttle.
    async loginAs(email, password = DEMO_PASSWORD) {
      const key = `${email.toLowerCase()}\n${password}`;
      const cached = tokens.get(key);
      if (cached) return cached;
      const response = await http().post('/api/auth/login').send({ email, password });
      if (response.status !== 200) throw new Error(`loginAs(${email}) answered ${response.status}: ${JSON.stringify(response.body)}`);
      tokens.set(key, response.body.accessToken);
      return response.body.accessToken;
    },
    async register(account) {
      const response = await http().post('/api/auth/register').send(account);
      if (response.status !== 201) throw new Error(`register(${account.email}) answered ${response.status}: ${JSON.stringify(response.body)}`);
      return response.body as AuthResponse;
    },
    async close() {
      await app.close();
      testEnv.remove();
    },
  };
}

/** The Authorization header for a token: `.set(bearer(token))`. */
export function bearer(token: string): { Authorization: string } {
  return { Authorization: `Bearer ${token}` };
}
