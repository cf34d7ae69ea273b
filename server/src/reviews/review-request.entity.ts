import { REVIEW_REQUEST_STATES, type ReviewRequestState } from '@channelwright/shared/schemas';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { ProjectEntity } from '../projects/project.entity.js';
import { RevisionEntity } from '../revisions/revision.entity.js';
import { UserEntity } from '../users/user.entity.js';

/**
 * A request that one reviewer review one revision. Written `open`; changed exactly once, to approved,
 * changes-requested or withdrawn, and never again (a trigger refuses any change of a closed request).
 */
@Entity('review_requests')
@Index('IDX_review_requests_revision', ['revisionId'])
@Index('IDX_review_requests_reviewer', ['reviewerId', 'state'])
@Index('IDX_review_requests_requester', ['requestedById', 'state'])
export class ReviewRequestEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar' })
  revisionId: string;

  @ManyToOne(() => RevisionEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'revisionId', foreignKeyConstraintName: 'FK_review_requests_revision' })
  revision: Relation<RevisionEntity>;

  @Column({ type: 'varchar' })
  projectId: string;

  @ManyToOne(() => ProjectEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'projectId', foreignKeyConstraintName: 'FK_review_requests_project' })
  project: Relation<ProjectEntity>;

  @Column({ type: 'varchar' })
  requestedById: string;

  @ManyToOne(() => UserEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'requestedById', foreignKeyConstraintName: 'FK_review_requests_requestedBy' })
  requestedBy: Relation<UserEntity>;

  @Column({ type: 'varchar' })
  reviewerId: string;

  @ManyToOne(() => UserEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'reviewerId', foreignKeyConstraintName: 'FK_review_requests_reviewer' })
  reviewer: Relation<UserEntity>;

  @Column({ type: 'text', default: '' })
  note: string;

  @Column({ type: 'simple-enum', enum: REVIEW_REQUEST_STATES, default: 'open' })
  state: ReviewRequestState;

  @Column({ type: 'datetime' })
  createdAt: Date;

  /** When it was approved, sent back or withdrawn. */
  @Column({ type: 'datetime', nullable: true })
  decidedAt: Date | null;

  @Column({ type: 'text', nullable: true })
  decisionComment: string | null;

  /** The revision hash the reviewer approved (re-verified at that moment). */
  @Column({ type: 'varchar', length: 64, nullable: true })
  signedHash: string | null;
}
