import { sheetReviewStateSchema, type SheetReviewState } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { revisionKeys } from './revision-keys';

/** `GET /api/sheets/:id/review-state`: the latest revision's state, the last sign-off, and the history. */
export const getSheetReviewState = (sheetId: string, signal?: AbortSignal): Promise<SheetReviewState> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/review-state`, { schema: sheetReviewStateSchema, signal });

export const sheetReviewStateQueryOptions = (sheetId: string) =>
  queryOptions({ queryKey: revisionKeys.sheetState(sheetId), queryFn: ({ signal }) => getSheetReviewState(sheetId, signal), enabled: sheetId !== '' });

export const useSheetReviewState = (sheetId: string) => useQuery(sheetReviewStateQueryOptions(sheetId));
