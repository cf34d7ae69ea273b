import type { DynamicModule, Type } from '@nestjs/common';
import { Test, type TestingModule } from '@nestjs/testing';
import { ConfigModule } from '../../src/config/config.module.js';
import { loadConfig, type EnvSource } from '../../src/config/load-config.js';
import { DatabaseModule } from '../../src/database/database.module.js';
import { createTestEnv } from './test-env.js';

export interface TestModule {
  module: TestingModule;
  close(): Promise<void>;
}

/**
 * A Nest module for a service spec: configuration and the real migrated database (SQLite, or PostgreSQL in postgres mode) in a
 * temporary DATA_DIR, plus the feature modules under test. Demo seeding is off unless asked for.
 */
export async function createTestModule(imports: Array<Type | DynamicModule>, env: EnvSource = {}): Promise<TestModule> {
  const testEnv = await createTestEnv({ SEED_DEMO: 'false', ...env });
  const module = await Test.createTestingModule({
    imports: [ConfigModule.forRoot(loadConfig(testEnv.env)), DatabaseModule, ...imports],
  }).compile();
  module.useLogger(false);
  await module.init();
  return {
    module,
    async close() {
      await module.close();
      await testEnv.remove();
    },
  };
}
