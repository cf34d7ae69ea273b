import { Column, CreateDateColumn, Entity, ForeignKey, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { SheetEntity } from './sheet.entity.js';
import { COLUMN_TYPES } from '../database/column-types.js';

/**
 * One transistor of a sheet: its targets, and the result the engine computed for them (or the
 * engine's refusal), stored as JSON text with the engine version and the process version that made it.
 */
@Entity('devices')
@Index('IDX_devices_sheet_name', ['sheetId', 'name'], { unique: true })
export class DeviceEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar' })
  sheetId: string;

  @ManyToOne(() => SheetEntity, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'sheetId', foreignKeyConstraintName: 'FK_devices_sheet' })
  sheet: Relation<SheetEntity>;

  /** Order in the sheet, 0 first. */
  @Column({ type: 'integer' })
  position: number;

  /** The targets' name, kept in a column of its own for the unique index. */
  @Column({ type: 'varchar', length: 50 })
  name: string;

  /** JSON text of the DeviceTargets. */
  @Column({ type: 'text' })
  targets: string;

  /** JSON text of the DeviceResult; null when the engine refused the targets. */
  @Column({ type: 'text', nullable: true })
  result: string | null;

  /** JSON text of the DeviceComputeError; null when there is a result. */
  @Column({ type: 'text', nullable: true })
  error: string | null;

  @Column({ type: 'varchar', length: 50 })
  engineVersion: string;

  /** The process version the result was computed on. */
  /** A process version (the processes module's table, read through ProcessesService). */
  @Column({ type: 'varchar' })
  @ForeignKey('process_versions', { name: 'FK_devices_processVersion', onDelete: 'RESTRICT' })
  processVersionId: string;

  @Column({ type: COLUMN_TYPES.timestamp })
  computedAt: Date;

  /** Optimistic concurrency: raised by every edit and every recompute. */
  @Column({ type: 'integer', default: 1 })
  version: number;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;

  @UpdateDateColumn({ type: COLUMN_TYPES.timestamp })
  updatedAt: Date;
}
