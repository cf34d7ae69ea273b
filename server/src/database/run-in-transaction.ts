import type { DataSource, EntityManager } from 'typeorm';

// better-sqlite3 gives TypeORM one connection, so two transactions open at once would interleave their
// statements (the second becomes a savepoint of the first, and a rollback undoes the wrong work).
// Transactions therefore queue up, one after the other, per DataSource.
const queues = new WeakMap<DataSource, Promise<unknown>>();

/**
 * Runs `work` in one transaction: all of it is written, or none of it. Use this for every
 * multi-step write instead of `dataSource.transaction`, so concurrent requests cannot interleave.
 */
export function runInTransaction<T>(dataSource: DataSource, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  const previous = queues.get(dataSource) ?? Promise.resolve();
  const result = previous.then(() => dataSource.transaction(work));
  queues.set(
    dataSource,
    result.catch(() => undefined),
  );
  return result;
}
