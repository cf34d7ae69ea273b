import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { EnvSource } from '../../src/config/load-config.js';

export const TEST_JWT_SECRET = 'channelwright-test-secret-0123456789abcdef';

export interface TestEnv {
  dataDir: string;
  env: EnvSource;
  /** Deletes the temporary DATA_DIR. */
  remove(): void;
}

/** An environment of its own for one test app: a fresh temporary DATA_DIR (or the one given, kept on remove), a test secret, no client build. */
export function createTestEnv(overrides: EnvSource = {}, existingDataDir?: string): TestEnv {
  const dataDir = existingDataDir ?? mkdtempSync(join(tmpdir(), 'channelwright-test-'));
  return {
    dataDir,
    env: {
      NODE_ENV: 'test',
      DATA_DIR: dataDir,
      JWT_SECRET: TEST_JWT_SECRET,
      SEED_DEMO: 'true',
      CLIENT_DIST: join(dataDir, 'no-client-build'),
      ...overrides,
    },
    remove: () => {
      if (existingDataDir === undefined) rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
