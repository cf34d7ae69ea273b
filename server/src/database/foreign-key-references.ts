import type { EntityManager } from 'typeorm';
import { engineOf } from './database-engine.js';

/** Rows of one table that point at the rows asked about. */
export interface TableReferences {
  table: string;
  count: number;
}

/** Rows asked about: those of `table` whose `column` equals `value`. */
export interface ReferencedRows {
  table: string;
  column: string;
  value: unknown;
}

/** One single-column foreign key: `table.from` refers to `target.to`. */
interface ForeignKey {
  table: string;
  from: string;
  target: string;
  to: string;
  cascades: boolean;
}

/**
 * Every row of another table that refers, through a foreign key, to rows of `targets`, except through keys that delete
 * the row with its target (ON DELETE CASCADE: a characterisation of a version does not keep it in use). Found through
 * the foreign keys themselves, so a module asking "is my row still in use?" needs to know no other module's tables.
 */
export async function findReferences(manager: EntityManager, targets: readonly ReferencedRows[], ignoreTables: ReadonlySet<string>): Promise<TableReferences[]> {
  const keys = engineOf(manager) === 'postgres' ? await postgresForeignKeys(manager) : await sqliteForeignKeys(manager);
  const placeholder = manager.connection.driver.createParameter('value', 0);
  const counts = new Map<string, number>();
  for (const key of keys) {
    if (key.cascades || ignoreTables.has(key.table)) continue;
    const target = targets.find((candidate) => candidate.table === key.target);
    if (!target) continue;
    const [row] = await manager.query(
      `SELECT COUNT(*) AS "count" FROM ${quote(key.table)} WHERE ${quote(key.from)} IN (SELECT ${quote(key.to)} FROM ${quote(target.table)} WHERE ${quote(target.column)} = ${placeholder})`,
      [target.value],
    );
    counts.set(key.table, (counts.get(key.table) ?? 0) + Number(row.count));
  }
  return [...counts].filter(([, count]) => count > 0).map(([table, count]) => ({ table, count }));
}

async function sqliteForeignKeys(manager: EntityManager): Promise<ForeignKey[]> {
  const tables: Array<{ name: string }> = await manager.query(`SELECT "name" FROM "sqlite_master" WHERE "type" = 'table' AND "name" NOT LIKE 'sqlite_%'`);
  const keys: ForeignKey[] = [];
  for (const { name } of tables) {
    const rows: Array<{ table: string; from: string; to: string | null; on_delete: string }> = await manager.query(`PRAGMA foreign_key_list(${quote(name)})`);
    for (const row of rows) keys.push({ table: name, from: row.from, target: row.table, to: row.to ?? 'id', cascades: row.on_delete.toUpperCase() === 'CASCADE' });
  }
  return keys;
}

/** The foreign keys of the current schema from pg_constraint (confdeltype 'c': ON DELETE CASCADE); ours have one column each. */
function postgresForeignKeys(manager: EntityManager): Promise<ForeignKey[]> {
  return manager.query(
    `SELECT source."relname" AS "table", source_column."attname" AS "from", target."relname" AS "target", target_column."attname" AS "to", constraint_row."confdeltype" = 'c' AS "cascades"
     FROM "pg_catalog"."pg_constraint" constraint_row
     JOIN "pg_catalog"."pg_class" source ON source."oid" = constraint_row."conrelid"
     JOIN "pg_catalog"."pg_class" target ON target."oid" = constraint_row."confrelid"
     JOIN "pg_catalog"."pg_attribute" source_column ON source_column."attrelid" = constraint_row."conrelid" AND source_column."attnum" = constraint_row."conkey"[1]
     JOIN "pg_catalog"."pg_attribute" target_column ON target_column."attrelid" = constraint_row."confrelid" AND target_column."attnum" = constraint_row."confkey"[1]
     WHERE constraint_row."contype" = 'f' AND source."relnamespace" = current_schema()::regnamespace
     ORDER BY source."relname", constraint_row."conname"`,
  );
}

function quote(identifier: string): string {
  return `"${identifier.replace(/"/g, '""')}"`;
}
