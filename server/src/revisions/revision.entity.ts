import { Column, Entity, ForeignKey, Index, PrimaryColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

/**
 * A frozen sheet: r1, r2 … per sheet. Every column is part of the snapshot and of its hash, so a
 * row is only ever inserted; triggers refuse UPDATE and DELETE (see the migration). Its review state
 * is derived from its review requests, never stored here.
 */
@Entity('revisions')
@Index('IDX_revisions_sheet_number', ['sheetId', 'number'], { unique: true })
@Index('IDX_revisions_project', ['projectId'])
export class RevisionEntity {
  /** Chosen before the insert, because the hash covers it. */
  @PrimaryColumn({ type: 'varchar' })
  id: string;

  // Foreign keys to other modules' tables are declared by table name; their rows are read through those modules' services.
  @Column({ type: 'varchar' })
  @ForeignKey('sheets', { name: 'FK_revisions_sheet', onDelete: 'RESTRICT' })
  sheetId: string;

  @Column({ type: 'varchar' })
  @ForeignKey('projects', { name: 'FK_revisions_project', onDelete: 'RESTRICT' })
  projectId: string;

  /** 1, 2, 3 … per sheet. */
  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'varchar', length: 500 })
  message: string;

  @Column({ type: 'varchar' })
  @ForeignKey('users', { name: 'FK_revisions_author', onDelete: 'RESTRICT' })
  authorId: string;

  /** Set by the service (to the millisecond), because the hash covers it. */
  @Column({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;

  /** JSON text of the sheet's own fields as frozen: name, description, temperature, corner, model. */
  @Column({ type: 'text' })
  sheetSnapshot: string;

  @Column({ type: 'varchar' })
  @ForeignKey('process_versions', { name: 'FK_revisions_processVersion', onDelete: 'RESTRICT' })
  processVersionId: string;

  @Column({ type: 'varchar' })
  processProfileId: string;

  @Column({ type: 'varchar', length: 100 })
  processName: string;

  @Column({ type: 'integer' })
  processVersionNumber: number;

  @Column({ type: 'varchar', length: 50 })
  engineVersion: string;

  /** SHA-256 (hex) of the canonical JSON of the revision and its devices (revision-content.ts). */
  @Column({ type: 'varchar', length: 64 })
  hash: string;
}
