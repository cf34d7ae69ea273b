import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { AccountAccess1796600000000 } from './1796600000000-account-access.js';
import { MIGRATIONS } from './index.js';

describe('the account-access migration', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'channelwright-migration-'));
  afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

  it('keeps the accounts of an existing installation as they were (confirmed, reading the whole library), while new ones start without', async () => {
    const database = join(dataDir, 'upgrade.sqlite');
    const before = MIGRATIONS.filter((migration) => migration !== AccountAccess1796600000000);
    const old = await new DataSource({ type: 'better-sqlite3', database, migrations: before }).initialize();
    await old.runMigrations();
    await old.query(`INSERT INTO "users" ("id", "email", "displayName", "passwordHash") VALUES ('u-1', 'early@fenwick.example', 'Early', 'x')`);
    await old.destroy();

    const upgraded = await new DataSource({ type: 'better-sqlite3', database, migrations: MIGRATIONS }).initialize();
    await upgraded.runMigrations();
    await upgraded.query(`INSERT INTO "users" ("id", "email", "displayName", "passwordHash") VALUES ('u-2', 'late@fenwick.example', 'Late', 'x')`);
    const rows = await upgraded.query(`SELECT "email", "libraryAccess", "emailConfirmed" FROM "users" ORDER BY "email"`);
    await upgraded.destroy();
    expect(rows).toEqual([
      { email: 'early@fenwick.example', libraryAccess: 1, emailConfirmed: 1 },
      { email: 'late@fenwick.example', libraryAccess: 0, emailConfirmed: 0 },
    ]);
  });
});
