import type { EntityManager } from 'typeorm';

/** Rows of one table that point at a profile or one of its versions. */
export interface ProcessReference {
  table: string;
  count: number;
}

const OWN_TABLES = new Set(['process_profiles', 'process_versions']);

/**
 * Everything in the database that refers to a profile or its versions, found through the foreign keys
 * themselves: any table with a foreign key to process_versions (as sheets and revisions have) or to
 * process_profiles counts, without registering anywhere. SQLite only (sqlite_master, PRAGMA foreign_key_list).
 */
export async function findProcessReferences(manager: EntityManager, profileId: string): Promise<ProcessReference[]> {
  const tables: Array<{ name: string }> = await manager.query(`SELECT "name" FROM "sqlite_master" WHERE "type" = 'table' AND "name" NOT LIKE 'sqlite_%'`);
  const references: ProcessReference[] = [];
  for (const { name } of tables) {
    if (OWN_TABLES.has(name)) continue;
    const keys: Array<{ table: string; from: string }> = await manager.query(`PRAGMA foreign_key_list(${quote(name)})`);
    let count = 0;
    for (const key of keys) {
      if (key.table === 'process_versions') {
        const [row] = await manager.query(
          `SELECT COUNT(*) AS "count" FROM ${quote(name)} WHERE ${quote(key.from)} IN (SELECT "id" FROM "process_versions" WHERE "profileId" = ?)`,
          [profileId],
        );
        count += Number(row.count);
      } else if (key.table === 'process_profiles') {
        const [row] = await manager.query(`SELECT COUNT(*) AS "count" FROM ${quote(name)} WHERE ${quote(key.from)} = ?`, [profileId]);
        count += Number(row.count);
      }
    }
    if (count > 0) references.push({ table: name, count });
  }
  return references;
}

function quote(identifier: string): string {
  return `"${identifier.replace(/"/g, '""')}"`;
}
