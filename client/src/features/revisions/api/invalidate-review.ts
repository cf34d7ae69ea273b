import type { QueryClient } from '@tanstack/react-query';
import { revisionKeys } from './revision-keys';

/** After any step of a review (request, decision, withdrawal): every revision read, and the sheet's review state. */
export const invalidateReview = (queryClient: QueryClient, sheetId: string) =>
  Promise.all([queryClient.invalidateQueries({ queryKey: revisionKeys.all }), queryClient.invalidateQueries({ queryKey: revisionKeys.sheetState(sheetId) })]);
