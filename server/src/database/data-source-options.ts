import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { DataSourceOptions } from 'typeorm';
import { MIGRATIONS } from './migrations/index.js';

type SqliteDataSourceOptions = Extract<DataSourceOptions, { type: 'better-sqlite3' }>;

export const DATABASE_FILE_NAME = 'channelwright.sqlite';

/** How long a statement waits for a lock held by another connection before failing with SQLITE_BUSY. */
const BUSY_TIMEOUT_MS = 5000;

/**
 * The SQLite database in DATA_DIR: WAL journal (readers do not block the writer), foreign keys on
 * (the driver sets them on every connection), a busy timeout, and the checked-in migrations.
 * synchronous=FULL: in WAL mode NORMAL survives a crash of the process but may lose the last commits on a
 * power loss; a sign-off acknowledged to a reviewer must survive both, so every commit is synced
 * (SQLite documentation, "Pragma statements: synchronous", sqlite.org, 2024). The cost is one fsync per
 * commit, small beside a request.
 */
export function dataSourceOptions(dataDir: string): SqliteDataSourceOptions {
  mkdirSync(dataDir, { recursive: true });
  return {
    type: 'better-sqlite3',
    database: join(dataDir, DATABASE_FILE_NAME),
    enableWAL: true,
    timeout: BUSY_TIMEOUT_MS,
    prepareDatabase: (database: { pragma(source: string): unknown }) => {
      database.pragma('synchronous = FULL');
    },
    migrations: MIGRATIONS,
    synchronize: false,
  };
}
