import { reviewRequestSchema, type CreateReviewRequestInput, type ReviewRequest } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invalidateReview } from './invalidate-review';

export interface CreateReviewRequestArgs {
  revisionId: string;
  request: CreateReviewRequestInput;
}

/** `POST /api/revisions/:id/review-requests`: asks a reviewer (not the author) to review the revision. */
export const createReviewRequest = ({ revisionId, request }: CreateReviewRequestArgs): Promise<ReviewRequest> =>
  apiRequest(`/revisions/${encodeURIComponent(revisionId)}/review-requests`, { method: 'POST', body: request, schema: reviewRequestSchema, quiet: true });

export function useCreateReviewRequest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createReviewRequest,
    onSuccess: (request) => invalidateReview(queryClient, request.sheetId),
  });
}
