import type { QueryClient } from '@tanstack/react-query';
import { reviewKeys } from '../../../lib/reviews/review-keys';
import { revisionKeys } from './revision-keys';

/**
 * After any step of a review (request, decision, withdrawal): every revision read, every list of review
 * requests (the revision's and the reviews inbox), and the sheet's review state.
 */
export const invalidateReview = (queryClient: QueryClient, sheetId: string) =>
  Promise.all([
    queryClient.invalidateQueries({ queryKey: revisionKeys.all }),
    queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
    queryClient.invalidateQueries({ queryKey: revisionKeys.sheetState(sheetId) }),
  ]);
