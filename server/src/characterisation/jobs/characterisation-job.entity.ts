import type { CharacterisationStatus } from '@channelwright/shared/schemas';
import { Column, CreateDateColumn, Entity, ForeignKey, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { COLUMN_TYPES } from '../../database/column-types.js';

/**
 * One characterisation of a process version's model card over a grid: its plan (the devices and their resolved
 * grids), its state and progress, and who runs it. The row is the job's truth on every machine: the queue only says
 * which job to run next. A version and grid have at most one queued, running or finished job (a partial unique index).
 */
@Entity('characterisation_jobs')
@Index('IDX_characterisation_jobs_version_grid', ['processVersionId', 'gridHash'], { unique: true, where: `"status" IN ('queued', 'running', 'done')` })
@Index('IDX_characterisation_jobs_status', ['status', 'createdAt'])
export class CharacterisationJobEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** A process version (the processes module's table, read through ProcessesService); its jobs go with it. */
  @Column({ type: 'varchar' })
  @ForeignKey('process_versions', { name: 'FK_characterisation_jobs_processVersion', onDelete: 'CASCADE' })
  processVersionId: string;

  /** SHA-256 of the canonical JSON of the plan. */
  @Column({ type: 'varchar', length: 64 })
  gridHash: string;

  /** JSON text of the PlannedDevice list: per device its polarity, flavour, card model and resolved grid. */
  @Column({ type: 'text' })
  plan: string;

  @Column({ type: 'varchar', length: 16 })
  status: CharacterisationStatus;

  /** Grid points simulated (all devices together). */
  @Column({ type: 'integer', default: 0 })
  done: number;

  @Column({ type: 'integer' })
  total: number;

  @Column({ type: COLUMN_TYPES.double, nullable: true })
  etaSeconds: number | null;

  /** JSON text of { code, message } for a failed or cancelled job. */
  @Column({ type: 'text', nullable: true })
  error: string | null;

  @Column({ type: 'varchar', length: 16, nullable: true })
  engine: 'native' | 'wasm' | null;

  /** Runs started (a server stop interrupts one; the next start resumes it). */
  @Column({ type: 'integer', default: 0 })
  attempts: number;

  /** Set by a cancel; the server running the job sees it at its next report and stops. */
  @Column({ type: 'boolean', default: false })
  cancelRequested: boolean;

  /** The server instance running the job, while it runs. */
  @Column({ type: 'varchar', length: 64, nullable: true })
  owner: string | null;

  /** When the running server last reported; a job silent for longer than the lease is taken over. */
  @Column({ type: COLUMN_TYPES.timestamp, nullable: true })
  heartbeatAt: Date | null;

  /** An account (the users module's table, read through UsersService). */
  @Column({ type: 'varchar', nullable: true })
  @ForeignKey('users', { name: 'FK_characterisation_jobs_requestedBy', onDelete: 'SET NULL' })
  requestedById: string | null;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;

  @Column({ type: COLUMN_TYPES.timestamp, nullable: true })
  startedAt: Date | null;

  @Column({ type: COLUMN_TYPES.timestamp, nullable: true })
  finishedAt: Date | null;

  @UpdateDateColumn({ type: COLUMN_TYPES.timestamp })
  updatedAt: Date;
}
