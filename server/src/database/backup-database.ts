import { existsSync, mkdirSync, renameSync, rmSync } from 'node:fs';
import { dirname, join } from 'node:path';
import Database from 'better-sqlite3';
import { DATABASE_FILE_NAME } from './data-source-options.js';

export interface BackupResult {
  /** The backup file written. */
  path: string;
  /** Pages copied (SQLite's page count of the source at the end of the copy). */
  pages: number;
  /** The result of `PRAGMA integrity_check` on the backup: "ok" or the problems found. */
  integrity: string;
}

/**
 * Why `npm run backup` cannot copy the configured database, or undefined when it can: it copies SQLite's file only;
 * PostgreSQL's own pg_dump takes a consistent copy of a live PostgreSQL database.
 */
export function backupRefusal(config: { databaseUrl?: string }): string | undefined {
  if (config.databaseUrl === undefined) return undefined;
  return [
    'DATABASE_URL names a PostgreSQL database: npm run backup copies only the SQLite database in DATA_DIR.',
    'Back up PostgreSQL with pg_dump, e.g. pg_dump --format=custom --file=channelwright.dump "$DATABASE_URL" (docs/operations.md).',
  ].join('\n');
}

/**
 * A consistent copy of DATA_DIR's database while the server keeps running: SQLite's online backup API
 * (through better-sqlite3's `backup()`), which copies page by page and restarts when a writer changes a
 * page already copied, so the file is one committed state, never half a transaction. Written beside the
 * target first and renamed, so a backup that fails leaves no partial file under the target's name; the copy
 * is then checked with `PRAGMA integrity_check`.
 * Restoring: stop the server and put the file in DATA_DIR as channelwright.sqlite (removing any -wal/-shm).
 */
export async function backupDatabase(dataDir: string, target: string): Promise<BackupResult> {
  const source = join(dataDir, DATABASE_FILE_NAME);
  if (!existsSync(source)) throw new Error(`There is no database to back up at ${source}`);
  mkdirSync(dirname(target), { recursive: true });
  const partial = `${target}.partial`;
  rmSync(partial, { force: true });
  const database = new Database(source, { readonly: true, fileMustExist: true });
  try {
    const progress = await database.backup(partial);
    const copy = new Database(partial, { readonly: true });
    let integrity: string;
    try {
      integrity = (copy.pragma('integrity_check') as Array<{ integrity_check: string }>).map((row) => row.integrity_check).join('; ');
    } finally {
      copy.close();
    }
    if (integrity !== 'ok') throw new Error(`The backup failed its integrity check: ${integrity}`);
    renameSync(partial, target);
    return { path: target, pages: progress.totalPages, integrity };
  } catch (error) {
    rmSync(partial, { force: true });
    throw error;
  } finally {
    database.close();
  }
}
