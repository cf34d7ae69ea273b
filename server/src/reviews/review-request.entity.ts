import { REVIEW_REQUEST_STATES, type ReviewRequestState } from '@channelwright/shared/schemas';
import { Column, Entity, ForeignKey, Index, PrimaryGeneratedColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

/**
 * A request that one reviewer review one revision. Written `open`; changed exactly once, to approved,
 * changes-requested or withdrawn, and never again (a trigger refuses any change of a closed request).
 */
@Entity('review_requests')
@Index('IDX_review_requests_revision', ['revisionId'])
@Index('IDX_review_requests_reviewer', ['reviewerId', 'state'])
@Index('IDX_review_requests_requester', ['requestedById', 'state'])
export class ReviewRequestEntity {
  // Foreign keys to other modules' tables are declared by table name; their rows are read through those modules' services.
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar' })
  @ForeignKey('revisions', { name: 'FK_review_requests_revision', onDelete: 'RESTRICT' })
  revisionId: string;

  @Column({ type: 'varchar' })
  @ForeignKey('projects', { name: 'FK_review_requests_project', onDelete: 'RESTRICT' })
  projectId: string;

  @Column({ type: 'varchar' })
  @ForeignKey('users', { name: 'FK_review_requests_requestedBy', onDelete: 'RESTRICT' })
  requestedById: string;

  @Column({ type: 'varchar' })
  @ForeignKey('users', { name: 'FK_review_requests_reviewer', onDelete: 'RESTRICT' })
  reviewerId: string;

  @Column({ type: 'text', default: '' })
  note: string;

  @Column({ type: 'simple-enum', enum: REVIEW_REQUEST_STATES, default: 'open' })
  state: ReviewRequestState;

  @Column({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;

  /** When it was approved, sent back or withdrawn. */
  @Column({ type: COLUMN_TYPES.timestamp, nullable: true })
  decidedAt: Date | null;

  @Column({ type: 'text', nullable: true })
  decisionComment: string | null;

  /** The revision hash the reviewer approved (re-verified at that moment). */
  @Column({ type: 'varchar', length: 64, nullable: true })
  signedHash: string | null;
}
