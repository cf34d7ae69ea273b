import type { EntityManager } from 'typeorm';

/** Rows of one table that point at the rows asked about. */
export interface TableReferences {
  table: string;
  count: number;
}

/**
 * Every row of another table that refers, through a foreign key, to rows of `target` (`target.column`
 * holding one of `ids`, or to a `via` table whose `viaColumn` holds one of them), except through keys that delete
 * the row with its target (ON DELETE CASCADE). Found through the
 * foreign keys themselves, so a module asking "is my row still in use?" needs to know no other module's
 * tables. SQLite only (sqlite_master, PRAGMA foreign_key_list); PostgreSQL would read information_schema.
 */
export async function findReferences(
  manager: EntityManager,
  targets: ReadonlyArray<{ table: string; where: string; params: unknown[] }>,
  ignoreTables: ReadonlySet<string>,
): Promise<TableReferences[]> {
  const tables: Array<{ name: string }> = await manager.query(`SELECT "name" FROM "sqlite_master" WHERE "type" = 'table' AND "name" NOT LIKE 'sqlite_%'`);
  const references: TableReferences[] = [];
  for (const { name } of tables) {
    if (ignoreTables.has(name)) continue;
    const keys: Array<{ table: string; from: string; to: string | null; on_delete: string }> = await manager.query(`PRAGMA foreign_key_list(${quote(name)})`);
    let count = 0;
    for (const key of keys) {
      // A row deleted with its target (ON DELETE CASCADE: a characterisation of a version) does not keep it in use.
      if (key.on_delete.toUpperCase() === 'CASCADE') continue;
      const target = targets.find((candidate) => candidate.table === key.table);
      if (!target) continue;
      const [row] = await manager.query(
        `SELECT COUNT(*) AS "count" FROM ${quote(name)} WHERE ${quote(key.from)} IN (SELECT ${quote(key.to ?? 'id')} FROM ${quote(target.table)} WHERE ${target.where})`,
        target.params,
      );
      count += Number(row.count);
    }
    if (count > 0) references.push({ table: name, count });
  }
  return references;
}

function quote(identifier: string): string {
  return `"${identifier.replace(/"/g, '""')}"`;
}
