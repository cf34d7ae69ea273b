import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { ParameterConvention1796800000000 } from './1796800000000-parameter-convention.js';
import { MIGRATIONS } from './index.js';

describe('the migration that records the parameter convention of process versions', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'channelwright-migration-'));
  afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

  it('marks every version written before it with convention 1, and keeps the convention immutable like the rest of a version', async () => {
    const database = join(dataDir, 'upgrade.sqlite');
    const before = MIGRATIONS.slice(0, MIGRATIONS.indexOf(ParameterConvention1796800000000));
    const old = await new DataSource({ type: 'better-sqlite3', database, migrations: before }).initialize();
    await old.runMigrations();
    await old.query(`INSERT INTO "process_profiles" ("id", "name", "nameKey", "latestVersion") VALUES ('pp-1', 'P', 'p', 2)`);
    await old.query(`INSERT INTO "process_versions" ("id", "profileId", "number", "definition") VALUES ('pv-1', 'pp-1', 1, '{}'), ('pv-2', 'pp-1', 2, '{}')`);
    await old.destroy();

    const upgraded = await new DataSource({ type: 'better-sqlite3', database, migrations: MIGRATIONS }).initialize();
    try {
      await upgraded.runMigrations();
      expect(await upgraded.query(`SELECT "id", "parameterConvention" FROM "process_versions" ORDER BY "number"`)).toEqual([
        { id: 'pv-1', parameterConvention: 1 },
        { id: 'pv-2', parameterConvention: 1 },
      ]);
      await expect(upgraded.query(`UPDATE "process_versions" SET "parameterConvention" = 2`)).rejects.toThrow(/immutable/);
    } finally {
      await upgraded.destroy();
    }
  });
});
