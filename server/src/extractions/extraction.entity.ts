import type { ExtractionStatus, Polarity } from '@channelwright/shared/schemas';
import { Column, CreateDateColumn, Entity, ForeignKey, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation, UpdateDateColumn } from 'typeorm';
import { ExtractionUploadEntity } from './extraction-upload.entity.js';
import { COLUMN_TYPES } from '../database/column-types.js';

/**
 * One fit of a profile's parameters to an upload's points: its options, its state and progress as a job (the row is
 * the job's truth), and what it found. A re-run is a new row on the same upload.
 */
@Entity('extractions')
@Index('IDX_extractions_status', ['status', 'createdAt'])
@Index('IDX_extractions_createdBy', ['createdById', 'createdAt'])
export class ExtractionEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar' })
  uploadId: string;

  @ManyToOne(() => ExtractionUploadEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'uploadId', foreignKeyConstraintName: 'FK_extractions_upload' })
  upload: Relation<ExtractionUploadEntity>;

  /** The base profile's version (the processes module's table, read through ProcessesService). */
  @Column({ type: 'varchar' })
  @ForeignKey('process_versions', { name: 'FK_extractions_processVersion', onDelete: 'RESTRICT' })
  processVersionId: string;

  @Column({ type: 'varchar', length: 4 })
  polarity: Polarity;

  /** JSON text of the ExtractionOptions. */
  @Column({ type: 'text' })
  options: string;

  @Column({ type: 'varchar', length: 16 })
  status: ExtractionStatus;

  @Column({ type: 'integer', default: 0 })
  iterations: number;

  @Column({ type: 'integer' })
  maxIterations: number;

  /** Set by a cancel of a running fit; the run stops and ends the row cancelled. */
  @Column({ type: 'boolean', default: false })
  cancelRequested: boolean;

  /** Runs started (a server stop interrupts one; the next start runs it again). */
  @Column({ type: 'integer', default: 0 })
  attempts: number;

  /** JSON text of { code, message } for a failed or cancelled fit. */
  @Column({ type: 'text', nullable: true })
  error: string | null;

  /** JSON text of the ExtractionResultResponse of a finished fit. */
  @Column({ type: 'text', nullable: true })
  result: string | null;

  /** JSON text of the ExtractionCurves (every point with the fit at it), sent as it is. */
  @Column({ type: 'text', nullable: true })
  curves: string | null;

  /** The profile version saved from this fit. */
  @Column({ type: 'varchar', nullable: true })
  savedProfileId: string | null;

  @Column({ type: 'integer', nullable: true })
  savedVersion: number | null;

  /** The extraction this one re-runs with other options. */
  @Column({ type: 'varchar', nullable: true })
  @ForeignKey('extractions', { name: 'FK_extractions_rerunOf', onDelete: 'SET NULL' })
  rerunOfId: string | null;

  /** An account (the users module's table, read through UsersService). */
  @Column({ type: 'varchar', nullable: true })
  @ForeignKey('users', { name: 'FK_extractions_createdBy', onDelete: 'SET NULL' })
  createdById: string | null;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;

  @Column({ type: COLUMN_TYPES.timestamp, nullable: true })
  startedAt: Date | null;

  @Column({ type: COLUMN_TYPES.timestamp, nullable: true })
  finishedAt: Date | null;

  @UpdateDateColumn({ type: COLUMN_TYPES.timestamp })
  updatedAt: Date;
}
