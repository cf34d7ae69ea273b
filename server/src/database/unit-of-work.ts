import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import { runInTransaction } from './run-in-transaction.js';

/** Drivers that give TypeORM a single connection, on which two open transactions would interleave. */
const SINGLE_CONNECTION_DRIVERS = new Set(['better-sqlite3', 'sqlite', 'sqljs']);

/**
 * The one way a feature reaches the database outside its own repositories: `run` opens a transaction that
 * spans every module it calls (each module's service takes the `EntityManager` it is handed and works
 * on its own tables only), and `manager` reads outside one. No class outside the database module sees the
 * DataSource.
 *
 * On SQLite (one connection) transactions queue up one after the other (runInTransaction); on a driver
 * with a connection pool, such as PostgreSQL, each gets a connection of its own and they run side by side.
 */
@Injectable()
export class UnitOfWork {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** All of `work` is written, or none of it. */
  run<T>(work: (manager: EntityManager) => Promise<T>): Promise<T> {
    if (SINGLE_CONNECTION_DRIVERS.has(this.dataSource.options.type)) return runInTransaction(this.dataSource, work);
    return this.dataSource.transaction(work);
  }

  /** Reads outside a transaction (the default of every `manager` parameter). */
  get manager(): EntityManager {
    return this.dataSource.manager;
  }
}
