import { MODELS } from '@channelwright/shared/schemas';
import { Column, CreateDateColumn, Entity, ForeignKey, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

/** A sizing sheet: the devices of one circuit, on one process profile version, with their defaults. */
@Entity('sheets')
@Index('IDX_sheets_project', ['projectId'])
export class SheetEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** A project (the projects module's table, read through ProjectsService). */
  @Column({ type: 'varchar' })
  @ForeignKey('projects', { name: 'FK_sheets_project', onDelete: 'RESTRICT' })
  projectId: string;

  @Column({ type: 'varchar', length: 100 })
  name: string;

  @Column({ type: 'text', default: '' })
  description: string;

  /** The process version the devices are sized on; a stored result made on another one is stale. */
  @Column({ type: 'varchar' })
  @ForeignKey('process_versions', { name: 'FK_sheets_processVersion', onDelete: 'RESTRICT' })
  processVersionId: string;

  /** Default temperature of the devices, °C; the process tnom when null. */
  @Column({ type: COLUMN_TYPES.double, nullable: true })
  temperature: number | null;

  @Column({ type: 'varchar', length: 50, default: 'TT' })
  corner: string;

  @Column({ type: 'simple-enum', enum: MODELS, default: 'all-region' })
  model: (typeof MODELS)[number];

  /** JSON text of the LeakageBudget; null without one. */
  @Column({ type: 'text', nullable: true })
  leakageBudget: string | null;

  /** JSON text of the OffsetBudget list. */
  @Column({ type: 'text', default: '[]' })
  offsetBudgets: string;

  /** Optimistic concurrency: raised by every change of the sheet's own fields. */
  @Column({ type: 'integer', default: 1 })
  version: number;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;

  @UpdateDateColumn({ type: COLUMN_TYPES.timestamp })
  updatedAt: Date;
}
