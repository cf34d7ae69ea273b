// The server suite once more on PostgreSQL (`npx jest -c jest.postgres.config.js`, with TEST_DATABASE_URL a superuser
// URL): each test app gets a fresh database of its own. Files about SQLite itself are left out: its PRAGMAs and
// online backup, durability of its file under SIGKILL, and migrations of SQLite data written before a change; and the
// two-process test, which makes a PostgreSQL database of its own in either pass and runs once, in the first.
import base from './jest.config.js';

export default {
  ...base,
  // Each test app also creates and migrates a database of its own (about 1.5 s more per app than SQLite's file).
  testTimeout: 60000,
  setupFiles: ['<rootDir>/test/helpers/postgres-mode.setup.ts'],
  setupFilesAfterEnv: ['<rootDir>/test/helpers/postgres-mode.after-env.ts'],
  testPathIgnorePatterns: ['/node_modules/', '<rootDir>/test/backup\\.e2e-spec\\.ts$', '<rootDir>/test/durability\\.e2e-spec\\.ts$', '<rootDir>/test/sqlite\\.e2e-spec\\.ts$', '<rootDir>/src/database/migrations/.*\\.spec\\.ts$', '<rootDir>/test/two-processes\\.e2e-spec\\.ts$'],
};
