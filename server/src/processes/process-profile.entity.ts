import { Column, CreateDateColumn, Entity, ForeignKey, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

/** A named process in the library. Its numbers live in immutable ProcessVersionEntity rows; this row points at the latest. */
@Entity('process_profiles')
export class ProcessProfileEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** As the latest version's definition spells it. */
  @Column({ type: 'varchar', length: 100 })
  name: string;

  /** The name folded to lower case (processNameKey): the unique index makes names unique regardless of case. */
  @Index('IDX_process_profiles_nameKey', { unique: true })
  @Column({ type: 'varchar', length: 100 })
  nameKey: string;

  /** As the latest version's definition has it. */
  @Column({ type: 'text', default: '' })
  description: string;

  @Column({ type: 'varchar', length: 50, default: '' })
  nodeClass: string;

  @Column({ type: 'boolean', default: false })
  deprecated: boolean;

  /** Seeded invented demo data, not any foundry's process. */
  @Column({ type: 'boolean', default: false })
  demoData: boolean;

  @Column({ type: 'integer' })
  latestVersion: number;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;

  @UpdateDateColumn({ type: COLUMN_TYPES.timestamp })
  updatedAt: Date;

  /** An account (the users module's table, read through UsersService). */
  @Column({ type: 'varchar', nullable: true })
  @ForeignKey('users', { name: 'FK_process_profiles_updatedBy', onDelete: 'SET NULL' })
  updatedById: string | null;
}

/** The key the unique index compares: names differing only in case (or Unicode form) collide. */
export function processNameKey(name: string): string {
  return name.trim().normalize('NFKC').toLowerCase();
}
