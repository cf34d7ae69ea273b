import { reviewRequestSchema, type DecideReviewRequestInput, type ReviewRequest } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invalidateReview } from './invalidate-review';

export interface DecideArgs {
  requestId: string;
  decision: DecideReviewRequestInput;
}

/** `POST /api/review-requests/:id/decision`: approve (signs off) or request changes; final. */
export const decideReviewRequest = ({ requestId, decision }: DecideArgs): Promise<ReviewRequest> =>
  apiRequest(`/review-requests/${encodeURIComponent(requestId)}/decision`, { method: 'POST', body: decision, schema: reviewRequestSchema, quiet: true });

export function useDecideReviewRequest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: decideReviewRequest,
    onSuccess: (request) => invalidateReview(queryClient, request.sheetId),
  });
}
