import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { ProcessVersionEntity } from '../processes/process-version.entity.js';
import { ProjectEntity } from '../projects/project.entity.js';
import { SheetEntity } from '../sheets/sheet.entity.js';
import { UserEntity } from '../users/user.entity.js';

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

  @Column({ type: 'varchar' })
  sheetId: string;

  @ManyToOne(() => SheetEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'sheetId', foreignKeyConstraintName: 'FK_revisions_sheet' })
  sheet: Relation<SheetEntity>;

  @Column({ type: 'varchar' })
  projectId: string;

  @ManyToOne(() => ProjectEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'projectId', foreignKeyConstraintName: 'FK_revisions_project' })
  project: Relation<ProjectEntity>;

  /** 1, 2, 3 … per sheet. */
  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'varchar', length: 500 })
  message: string;

  @Column({ type: 'varchar' })
  authorId: string;

  @ManyToOne(() => UserEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'authorId', foreignKeyConstraintName: 'FK_revisions_author' })
  author: Relation<UserEntity>;

  /** Set by the service (to the millisecond), because the hash covers it. */
  @Column({ type: 'datetime' })
  createdAt: Date;

  /** JSON text of the sheet's own fields as frozen: name, description, temperature, corner, model. */
  @Column({ type: 'text' })
  sheetSnapshot: string;

  @Column({ type: 'varchar' })
  processVersionId: string;

  @ManyToOne(() => ProcessVersionEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'processVersionId', foreignKeyConstraintName: 'FK_revisions_processVersion' })
  processVersion: Relation<ProcessVersionEntity>;

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
