import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { RevisionEntity } from '../revisions/revision.entity.js';
import { UserEntity } from '../users/user.entity.js';

/** A comment on a revision, or on one of its devices. Part of the record: triggers refuse UPDATE and DELETE. */
@Entity('revision_comments')
@Index('IDX_revision_comments_revision', ['revisionId', 'createdAt'])
export class RevisionCommentEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar' })
  revisionId: string;

  @ManyToOne(() => RevisionEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'revisionId', foreignKeyConstraintName: 'FK_revision_comments_revision' })
  revision: Relation<RevisionEntity>;

  /** The sheet device id of a device of the revision; null for the whole revision. */
  @Column({ type: 'varchar', nullable: true })
  deviceId: string | null;

  /** The device's name in the revision, kept for display. */
  @Column({ type: 'varchar', length: 50, nullable: true })
  deviceName: string | null;

  @Column({ type: 'varchar' })
  authorId: string;

  @ManyToOne(() => UserEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'authorId', foreignKeyConstraintName: 'FK_revision_comments_author' })
  author: Relation<UserEntity>;

  @Column({ type: 'text' })
  body: string;

  @Column({ type: 'datetime' })
  createdAt: Date;
}
