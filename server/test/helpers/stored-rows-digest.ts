import { createHash } from 'node:crypto';
import type { DataSource } from 'typeorm';

/**
 * A digest of every row of every table: equal digests, nothing written. Mail is delivered in the background
 * after the request that queued it: the outbox counts by its rows (a refused request queues none), not by
 * their delivery state, and the local mail sink's received copies are left out. Each table's rows are hashed as a
 * sorted list of their JSON texts: the content, whatever order the engine keeps them in (PostgreSQL moves a row it
 * rewrote with the same values).
 */
export async function storedRowsDigest(dataSource: DataSource): Promise<string> {
  const postgres = dataSource.options.type === 'postgres';
  const tables: Array<{ name: string }> = await dataSource.query(
    postgres
      ? `SELECT "table_name" AS "name" FROM "information_schema"."tables" WHERE "table_schema" = current_schema() AND "table_type" = 'BASE TABLE' AND "table_name" <> 'received_mail' ORDER BY "table_name"`
      : `SELECT "name" FROM sqlite_master WHERE "type" = 'table' AND "name" NOT LIKE 'sqlite_%' AND "name" <> 'received_mail' ORDER BY "name"`,
  );
  const hash = createHash('sha256');
  for (const { name } of tables) {
    const columns = name === 'outbox_messages' ? '"id"' : '*';
    const rows: unknown[] = await dataSource.query(`SELECT ${columns} FROM "${name}"`);
    hash.update(name).update(JSON.stringify(rows.map((row) => JSON.stringify(row)).sort()));
  }
  return hash.digest('hex');
}
