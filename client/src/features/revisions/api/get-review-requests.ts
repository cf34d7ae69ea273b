import { reviewRequestListSchema, type ReviewRequest } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { reviewKeys } from '../../../lib/reviews/review-keys';

/** `GET /api/revisions/:id/review-requests`: every request of the revision, oldest first. */
export const getReviewRequests = (revisionId: string, signal?: AbortSignal): Promise<ReviewRequest[]> =>
  apiRequest(`/revisions/${encodeURIComponent(revisionId)}/review-requests`, { schema: reviewRequestListSchema, signal });

export const reviewRequestsQueryOptions = (revisionId: string) =>
  queryOptions({ queryKey: reviewKeys.ofRevision(revisionId), queryFn: ({ signal }) => getReviewRequests(revisionId, signal) });

export const useReviewRequests = (revisionId: string) => useQuery(reviewRequestsQueryOptions(revisionId));
