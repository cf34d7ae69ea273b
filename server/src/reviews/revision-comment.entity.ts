import { Column, Entity, ForeignKey, Index, PrimaryGeneratedColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

/** A comment on a revision, or on one of its devices. Part of the record: triggers refuse UPDATE and DELETE. */
@Entity('revision_comments')
@Index('IDX_revision_comments_revision', ['revisionId', 'createdAt'])
export class RevisionCommentEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar' })
  @ForeignKey('revisions', { name: 'FK_revision_comments_revision', onDelete: 'RESTRICT' })
  revisionId: string;

  /** The sheet device id of a device of the revision; null for the whole revision. */
  @Column({ type: 'varchar', nullable: true })
  deviceId: string | null;

  /** The device's name in the revision, kept for display. */
  @Column({ type: 'varchar', length: 50, nullable: true })
  deviceName: string | null;

  @Column({ type: 'varchar' })
  @ForeignKey('users', { name: 'FK_revision_comments_author', onDelete: 'RESTRICT' })
  authorId: string;

  @Column({ type: 'text' })
  body: string;

  @Column({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;
}
