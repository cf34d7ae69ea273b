import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { databaseEngineOf } from '../../src/database/database-engine.js';

/**
 * The engine the suite runs on: SQLite in each test's DATA_DIR, or PostgreSQL in postgres mode (jest.postgres.config.js
 * sets DATABASE_URL to TEST_DATABASE_URL before anything is imported, so the entities take PostgreSQL's column types).
 */
export const TEST_DATABASE_ENGINE = databaseEngineOf(process.env);

/** Where a DATA_DIR notes the PostgreSQL database made for it, so a server restarted on that DATA_DIR finds its data. */
const DATABASE_URL_FILE = '.test-database-url';

/** Databases this test file created; all are dropped when it ends (postgres-mode.after-env.ts). */
const created = new Set<string>();
let admin: Promise<DataSource> | undefined;

function adminConnection(): Promise<DataSource> {
  const url = process.env.TEST_DATABASE_URL;
  if (!url) throw new Error('TEST_DATABASE_URL must name a PostgreSQL superuser URL in postgres mode');
  admin ??= new DataSource({ type: 'postgres', url, poolSize: 1 }).initialize();
  return admin;
}

/**
 * The PostgreSQL database of a test's DATA_DIR (postgres mode): the one made for it earlier, or a fresh empty one with a
 * random name. Byte order and ASCII-only case rules (C locale), as SQLite's. Undefined on SQLite.
 */
export async function testDatabaseUrl(dataDir: string): Promise<{ url: string; createdNow: boolean } | undefined> {
  if (TEST_DATABASE_ENGINE !== 'postgres') return undefined;
  const file = join(dataDir, DATABASE_URL_FILE);
  if (existsSync(file)) return { url: readFileSync(file, 'utf8'), createdNow: false };
  const name = `cw_test_${randomBytes(6).toString('hex')}`;
  await (await adminConnection()).query(`CREATE DATABASE "${name}" TEMPLATE template0 ENCODING 'UTF8' LC_COLLATE 'C' LC_CTYPE 'C'`);
  created.add(name);
  const url = new URL(process.env.TEST_DATABASE_URL!);
  url.pathname = `/${name}`;
  writeFileSync(file, url.toString());
  return { url: url.toString(), createdNow: true };
}

export async function dropTestDatabase(url: string): Promise<void> {
  const name = decodeURIComponent(new URL(url).pathname.slice(1));
  await (await adminConnection()).query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
  created.delete(name);
}

/** Drops what this test file created and closes the admin connection. */
export async function dropTestDatabases(): Promise<void> {
  if (!admin) return;
  const connection = await admin;
  for (const name of created) await connection.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
  created.clear();
  await connection.destroy();
  admin = undefined;
}

/** A test's raw SQL with SQLite's `?` placeholders, numbered ($1, $2, …) for PostgreSQL. */
export function portableSql(sql: string): string {
  if (TEST_DATABASE_ENGINE !== 'postgres') return sql;
  let n = 0;
  return sql.replace(/\?/g, () => `$${++n}`);
}
