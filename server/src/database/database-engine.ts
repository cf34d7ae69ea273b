import type { DataSource, EntityManager, QueryRunner } from 'typeorm';

/** The databases the server runs on: SQLite in DATA_DIR (the default), or PostgreSQL when DATABASE_URL names one. */
export type DatabaseEngine = 'sqlite' | 'postgres';

/** The engine an environment asks for: PostgreSQL exactly when DATABASE_URL is set. */
export function databaseEngineOf(env: Record<string, string | undefined>): DatabaseEngine {
  return env.DATABASE_URL !== undefined && env.DATABASE_URL.trim() !== '' ? 'postgres' : 'sqlite';
}

/** The engine behind a connection (a migration's query runner, a transaction's manager or the DataSource). */
export function engineOf(source: DataSource | EntityManager | QueryRunner): DatabaseEngine {
  const dataSource = 'connection' in source ? source.connection : source;
  return dataSource.options.type === 'postgres' ? 'postgres' : 'sqlite';
}

/** Row lock options for a find inside a transaction. */
export interface RowLock {
  mode: 'pessimistic_write';
  onLocked?: 'skip_locked';
}

/**
 * Locks the rows a transaction reads before it changes them (SELECT … FOR UPDATE), so that two transactions on a pooled
 * engine cannot both act on what they read. On SQLite none is needed, nor supported: its transactions run one after the
 * other (UnitOfWork). `skipLocked`: rows another transaction holds are passed over instead of waited for (a job claim).
 */
export function rowLock(manager: EntityManager, options: { skipLocked?: boolean } = {}): RowLock | undefined {
  if (engineOf(manager) !== 'postgres') return undefined;
  return options.skipLocked ? { mode: 'pessimistic_write', onLocked: 'skip_locked' } : { mode: 'pessimistic_write' };
}
