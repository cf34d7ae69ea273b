import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { EnvSource } from '../../src/config/load-config.js';
import { dropTestDatabase, testDatabaseUrl } from './test-database.js';

export const TEST_JWT_SECRET = 'channelwright-test-secret-0123456789abcdef';

export interface TestEnv {
  dataDir: string;
  env: EnvSource;
  /** Deletes the temporary DATA_DIR (and, in postgres mode, the database made for it). */
  remove(): Promise<void>;
}

/**
 * An environment of its own for one test app: a fresh temporary DATA_DIR (or the one given, kept on remove), a test
 * secret, no client build; in postgres mode also DATABASE_URL, a fresh database (or the given DATA_DIR's).
 */
export async function createTestEnv(overrides: EnvSource = {}, existingDataDir?: string): Promise<TestEnv> {
  const dataDir = existingDataDir ?? mkdtempSync(join(tmpdir(), 'channelwright-test-'));
  const database = await testDatabaseUrl(dataDir);
  return {
    dataDir,
    env: {
      NODE_ENV: 'test',
      DATA_DIR: dataDir,
      ...(database ? { DATABASE_URL: database.url } : {}),
      JWT_SECRET: TEST_JWT_SECRET,
      SEED_DEMO: 'true',
      CLIENT_DIST: join(dataDir, 'no-client-build'),
      ...overrides,
    },
    async remove() {
      if (existingDataDir !== undefined) return;
      if (database?.createdNow) await dropTestDatabase(database.url);
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
