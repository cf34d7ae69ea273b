import type { ReviewInboxQuery } from '@channelwright/shared/schemas';

/**
 * Every query key of review requests, from one place: the reviews inbox lists them and the revision
 * page shows those of one revision, so a request, decision or withdrawal refreshes both through `all`.
 */
export const reviewKeys = {
  all: ['review-requests'] as const,
  /** `GET /api/review-requests?mine=&state=`. */
  inbox: (query: Partial<ReviewInboxQuery>) => [...reviewKeys.all, 'inbox', query] as const,
  /** `GET /api/revisions/:id/review-requests`. */
  ofRevision: (revisionId: string) => [...reviewKeys.all, 'revision', revisionId] as const,
};
