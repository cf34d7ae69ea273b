import { createHash } from 'node:crypto';
import type { DataSource } from 'typeorm';

/**
 * A digest of every row of every table: equal digests, nothing written. Mail is delivered in the background
 * after the request that queued it: the outbox counts by its rows (a refused request queues none), not by
 * their delivery state, and the local mail sink's received copies are left out.
 */
export async function storedRowsDigest(dataSource: DataSource): Promise<string> {
  const tables: Array<{ name: string }> = await dataSource.query(`SELECT "name" FROM sqlite_master WHERE "type" = 'table' AND "name" NOT LIKE 'sqlite_%' AND "name" <> 'received_mail' ORDER BY "name"`);
  const hash = createHash('sha256');
  for (const { name } of tables) {
    const columns = name === 'outbox_messages' ? '"id"' : '*';
    hash.update(name).update(JSON.stringify(await dataSource.query(`SELECT ${columns} FROM "${name}" ORDER BY rowid`)));
  }
  return hash.digest('hex');
}
