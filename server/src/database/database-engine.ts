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
