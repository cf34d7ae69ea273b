import { reviewRequestSchema, type ReviewRequest } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invalidateReview } from './invalidate-review';

/** `POST /api/review-requests/:id/withdraw`: the requester takes an open request back. */
export const withdrawReviewRequest = (requestId: string): Promise<ReviewRequest> =>
  apiRequest(`/review-requests/${encodeURIComponent(requestId)}/withdraw`, { method: 'POST', schema: reviewRequestSchema });

export function useWithdrawReviewRequest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: withdrawReviewRequest,
    onSuccess: (request) => invalidateReview(queryClient, request.sheetId),
  });
}
