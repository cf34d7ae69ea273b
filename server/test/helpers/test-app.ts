import type { AuthResponse, RegisterRequest } from '@channelwright/shared/schemas';
import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createApp } from '../../src/app.factory.js';
import type { EnvSource } from '../../src/config/load-config.js';
import { MailDeliveryService } from '../../src/mail/mail-delivery.service.js';
import { MailboxService } from '../../src/mail/mailbox.service.js';
import { DEMO_PASSWORD } from '../../src/seed/demo-accounts.js';
import { portableSql, TEST_DATABASE_ENGINE } from './test-database.js';
import { createTestEnv } from './test-env.js';

export interface TestAppOptions {
  /** Seed the invented demo data (default true). */
  seed?: boolean;
  /** More environment variables (SIGNUP_ENABLED, JWT_TTL, …); DATA_DIR is a fresh temporary folder unless `dataDir`. */
  env?: EnvSource;
  /** Run on this DATA_DIR (another app's, to restart a server on its data); it is left in place on close. */
  dataDir?: string;
}

export interface TestApp {
  app: NestExpressApplication;
  /** The real database behind the app (SQLite, or PostgreSQL in postgres mode), for checks (and deliberate tampering) in tests. */
  dataSource: DataSource;
  /** Raw SQL on that database with SQLite's `?` placeholders (numbered for PostgreSQL). */
  query: DataSource['query'];
  /** Drops a trigger (to tamper with what it guards). */
  dropTrigger(name: string, table: string): Promise<void>;
  dataDir: string;
  /** A supertest client for the app: `t.http().get('/api/health')`. */
  http(): ReturnType<typeof request>;
  /** Signs in and returns the access token; demo accounts need no password. Cached per account. */
  loginAs(email: string, password?: string): Promise<string>;
  /** Registers an account (following the confirmation link mailed to it, as its owner would) and returns its token and user. */
  register(account: RegisterRequest): Promise<AuthResponse>;
  /** Stops the app and deletes its DATA_DIR (unless `keepData`: another app is started on it next). */
  close(options?: { keepData?: boolean }): Promise<void>;
}

/** The real app (real migrations, a real SQLite file or PostgreSQL database) on a temporary DATA_DIR of its own. */
export async function createTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const testEnv = await createTestEnv({ SEED_DEMO: String(options.seed ?? true), ...options.env }, options.dataDir);
  let app: NestExpressApplication;
  try {
    app = await createApp({ env: testEnv.env, logger: ['error'] });
  } catch (error) {
    await testEnv.remove();
    throw error;
  }
  const http = () => request(app.getHttpServer());
  const tokens = new Map<string, string>();

  return {
    app,
    dataSource: app.get(DataSource),
    dataDir: testEnv.dataDir,
    query: (sql: string, params?: unknown[]) => app.get(DataSource).query(portableSql(sql), params),
    async dropTrigger(name, table) {
      await app.get(DataSource).query(TEST_DATABASE_ENGINE === 'postgres' ? `DROP TRIGGER IF EXISTS "${name}" ON "${table}"` : `DROP TRIGGER IF EXISTS "${name}"`);
    },
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
      if (response.status === 201) return response.body as AuthResponse;
      if (response.status !== 202) throw new Error(`register(${account.email}) answered ${response.status}: ${JSON.stringify(response.body)}`);
      const token = await confirmationToken(app, account.email);
      const confirmed = await http().post('/api/auth/confirm').send({ token, password: account.password });
      if (confirmed.status !== 200) throw new Error(`confirm(${account.email}) answered ${confirmed.status}: ${JSON.stringify(confirmed.body)}`);
      return confirmed.body as AuthResponse;
    },
    async close(closing = {}) {
      await app.close();
      if (!closing.keepData) await testEnv.remove();
    },
  };
}

/** The token of the newest confirmation link the local mail sink received for `email`. */
export async function confirmationToken(app: NestExpressApplication, email: string): Promise<string> {
  await app.get(MailDeliveryService).idle();
  const [mail] = await app.get(MailboxService).received({ exactTo: email.trim().toLowerCase(), limit: 1 });
  const link = /\/sign-in\?confirm=([^\s"<]+)/.exec(mail?.text ?? '');
  if (!link) throw new Error(`no confirmation link was mailed to ${email}`);
  return decodeURIComponent(link[1]);
}

/** The Authorization header for a token: `.set(bearer(token))`. */
export function bearer(token: string): { Authorization: string } {
  return { Authorization: `Bearer ${token}` };
}
