import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { SheetsTableModel1796700000001 } from './1796700000001-sheets-table-model.js';
import { MIGRATIONS } from './index.js';

describe('the migration that lets sheets default to the table model', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'channelwright-migration-'));
  afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

  it('rebuilds the sheets table with every sheet and device kept, and then accepts model "table" (which it refused before)', async () => {
    const database = join(dataDir, 'upgrade.sqlite');
    const before = MIGRATIONS.slice(0, MIGRATIONS.indexOf(SheetsTableModel1796700000001));
    const old = await new DataSource({ type: 'better-sqlite3', database, migrations: before }).initialize();
    await old.runMigrations();
    await old.query(`INSERT INTO "users" ("id", "email", "displayName", "passwordHash") VALUES ('u-1', 'a@fenwick.example', 'A', 'x')`);
    await old.query(`INSERT INTO "projects" ("id", "name", "createdById") VALUES ('p-1', 'Project', 'u-1')`);
    await old.query(`INSERT INTO "process_profiles" ("id", "name", "nameKey", "latestVersion") VALUES ('pp-1', 'P', 'p', 1)`);
    await old.query(`INSERT INTO "process_versions" ("id", "profileId", "number", "definition") VALUES ('pv-1', 'pp-1', 1, '{}')`);
    await old.query(`INSERT INTO "sheets" ("id", "projectId", "name", "processVersionId", "model") VALUES ('s-1', 'p-1', 'Sheet', 'pv-1', 'square-law')`);
    await old.query(`INSERT INTO "devices" ("id", "sheetId", "position", "name", "targets", "engineVersion", "processVersionId", "computedAt") VALUES ('d-1', 's-1', 0, 'M1', '{}', 'e', 'pv-1', datetime('now'))`);
    await expect(old.query(`UPDATE "sheets" SET "model" = 'table'`)).rejects.toThrow(/CHECK/);
    await old.destroy();

    const upgraded = await new DataSource({ type: 'better-sqlite3', database, migrations: MIGRATIONS }).initialize();
    await upgraded.runMigrations();
    const sheets = await upgraded.query(`SELECT "id", "name", "model" FROM "sheets"`);
    const devices = await upgraded.query(`SELECT "id", "sheetId" FROM "devices"`);
    await upgraded.query(`UPDATE "sheets" SET "model" = 'table'`);
    await expect(upgraded.query(`UPDATE "sheets" SET "model" = 'other'`)).rejects.toThrow(/CHECK/);
    await upgraded.destroy();
    expect(sheets).toEqual([{ id: 's-1', name: 'Sheet', model: 'square-law' }]);
    expect(devices).toEqual([{ id: 'd-1', sheetId: 's-1' }]);
  });
});
