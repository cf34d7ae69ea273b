import { sheetCornersResponseSchema, type SheetCornersRequestInput, type SheetCornersResponse } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { sheetKeys } from '../../../lib/sheets/sheet-keys';

/** `POST /api/sheets/:id/corners`: the corner × temperature (× supply) matrix of the sheet's sized devices, in one answer. */
export const getSheetCorners = (sheetId: string, request: SheetCornersRequestInput, signal?: AbortSignal): Promise<SheetCornersResponse> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/corners`, { method: 'POST', body: request, schema: sheetCornersResponseSchema, signal });

/** Under the sheet's own key: every device write (which changes what the matrix checks) refreshes it. */
export const sheetCornersQueryOptions = (sheetId: string, request: SheetCornersRequestInput) =>
  queryOptions({
    queryKey: [...sheetKeys.detail(sheetId), 'corners', request] as const,
    queryFn: ({ signal }) => getSheetCorners(sheetId, request, signal),
    placeholderData: keepPreviousData,
  });

export const useSheetCorners = (sheetId: string, request: SheetCornersRequestInput) => useQuery(sheetCornersQueryOptions(sheetId, request));
