import type { ReviewRequestState } from '@channelwright/shared/schemas';
import type { EntityManager } from 'typeorm';

/** What a revision's state and sign-off are derived from: its review requests, as the reviews feature reports them. */
export interface ReviewFacts {
  id: string;
  revisionId: string;
  state: ReviewRequestState;
  createdAt: Date;
  decidedAt: Date | null;
  reviewerId: string;
  signedHash: string | null;
}

/**
 * The reviews feature answers which requests a revision has: it registers one with
 * `{ provide: REVISION_REVIEWS, useClass: … }`. Revisions store no state of their own (they never change),
 * and know no review table.
 */
export interface RevisionReviewSource {
  requestsOf(revisionIds: readonly string[], manager: EntityManager): Promise<ReviewFacts[]>;
}

export const REVISION_REVIEWS = Symbol('REVISION_REVIEWS');
