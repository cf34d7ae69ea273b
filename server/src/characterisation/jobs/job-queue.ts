/**
 * Runs one stored job to its end (done, failed or cancelled, written by the handler), or returns early when `signal`
 * aborts with reason "shutdown" (the server stops: the job's row is left running, and it is resumed once its lease
 * expires) or "cancel".
 */
export type JobHandler = (jobId: string, owner: string, signal: AbortSignal) => Promise<void>;

/**
 * Which characterisation runs where. The job's row in the database is the product's truth (status, progress, owner,
 * heartbeat); a queue only hands the ids of queued jobs to workers. The embedded queue (one server, SQLite) claims them
 * from the table itself; a PostgreSQL-backed one (pg-boss 10.x: `send` on enqueue, `work` on start, one job per
 * worker) can run the same handler on several machines.
 */
export interface JobQueue {
  /** Starts handing jobs to the handler (at application start). */
  start(handler: JobHandler): void;
  /** A job row was stored queued: have a worker take it. */
  enqueue(jobId: string): Promise<void>;
  /** The job's row asks for a cancel: stop it now if it runs here (elsewhere its server sees the flag at its next report). */
  cancel(jobId: string): Promise<void>;
  /** Stops taking jobs and stops those running here without ending them (as a crash would: they are resumed). */
  stop(): Promise<void>;
}

export const JOB_QUEUE = Symbol('JOB_QUEUE');

/** Why a running job's signal aborted. */
export type StopReason = 'shutdown' | 'cancel';
