import { setTimeout as sleep } from 'node:timers/promises';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { QueryFailedError, type DataSource, type EntityManager } from 'typeorm';
import { runInTransaction } from './run-in-transaction.js';

/** Drivers that give TypeORM a single connection, on which two open transactions would interleave. */
const SINGLE_CONNECTION_DRIVERS = new Set(['better-sqlite3', 'sqlite', 'sqljs']);

/** Runs of one unit of work that PostgreSQL may refuse as not serializable before the refusal reaches the caller. */
const MAX_SERIALIZABLE_ATTEMPTS = 8;

/**
 * PostgreSQL's SQLSTATEs for "run it again": serialization_failure and deadlock_detected (PostgreSQL documentation,
 * "Serialization Failure Handling", 2024).
 */
const RETRYABLE_SQLSTATES = new Set(['40001', '40P01']);

/**
 * The one way a feature reaches the database outside its own repositories: `run` opens a transaction that
 * spans every module it calls (each module's service takes the `EntityManager` it is handed and works
 * on its own tables only), and `manager` reads outside one. No class outside the database module sees the
 * DataSource.
 *
 * On SQLite (one connection) transactions queue up one after the other (runInTransaction). On PostgreSQL each gets a
 * connection of its own and they run side by side at SERIALIZABLE isolation, so every unit of work still acts as if it
 * ran alone (a check such as "is my base version the latest?" holds when its write commits): one that PostgreSQL
 * cannot serialize is rolled back and run again, as the documentation asks of applications.
 */
@Injectable()
export class UnitOfWork {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** What to do once each open transaction has committed, by its manager. */
  private readonly committed = new WeakMap<EntityManager, Array<() => void>>();

  /** All of `work` is written, or none of it. `work` may run more than once on PostgreSQL: it must only touch the database. */
  async run<T>(work: (manager: EntityManager) => Promise<T>): Promise<T> {
    const single = SINGLE_CONNECTION_DRIVERS.has(this.dataSource.options.type);
    for (let attempt = 1; ; attempt++) {
      const callbacks: Array<() => void> = [];
      const tracked = (manager: EntityManager) => {
        this.committed.set(manager, callbacks);
        return work(manager);
      };
      try {
        const result = single ? await runInTransaction(this.dataSource, tracked) : await this.dataSource.transaction('SERIALIZABLE', tracked);
        for (const callback of callbacks) callback();
        return result;
      } catch (error) {
        if (single || attempt >= MAX_SERIALIZABLE_ATTEMPTS || !isRetryable(error)) throw error;
        // A little random wait, growing with the attempts, so the transactions that collided do not collide again.
        await sleep(Math.random() * 10 * attempt);
      }
    }
  }

  /**
   * Runs `callback` once the transaction of `manager` has committed (at once outside one; never if it rolls back). For
   * work that must see the transaction's rows from another connection, such as delivering the mail it queued: on
   * PostgreSQL that connection would not see them before the commit.
   */
  afterCommit(manager: EntityManager | undefined, callback: () => void): void {
    const callbacks = manager === undefined ? undefined : this.committed.get(manager);
    if (callbacks) callbacks.push(callback);
    else callback();
  }

  /** Reads outside a transaction (the default of every `manager` parameter). */
  get manager(): EntityManager {
    return this.dataSource.manager;
  }
}

function isRetryable(error: unknown): boolean {
  const code = error instanceof QueryFailedError ? (error.driverError as { code?: unknown } | undefined)?.code : undefined;
  return typeof code === 'string' && RETRYABLE_SQLSTATES.has(code);
}
