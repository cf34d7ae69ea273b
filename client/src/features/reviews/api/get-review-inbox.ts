import { reviewRequestListSchema, type ReviewInboxQuery, type ReviewRequest } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { reviewKeys } from '../../../lib/reviews/review-keys';

/** `GET /api/review-requests?mine=assigned|authored&state=`: the signed-in user's inbox, newest first. */
export const getReviewInbox = (query: Partial<ReviewInboxQuery>, signal?: AbortSignal): Promise<ReviewRequest[]> => {
  const params = new URLSearchParams();
  if (query.mine) params.set('mine', query.mine);
  if (query.state) params.set('state', query.state);
  return apiRequest(`/review-requests?${params}`, { schema: reviewRequestListSchema, signal });
};

export const reviewInboxQueryOptions = (query: Partial<ReviewInboxQuery>) =>
  queryOptions({ queryKey: reviewKeys.inbox(query), queryFn: ({ signal }) => getReviewInbox(query, signal) });

export const useReviewInbox = (query: Partial<ReviewInboxQuery>) => useQuery(reviewInboxQueryOptions(query));
