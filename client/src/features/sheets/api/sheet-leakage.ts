import { sheetLeakageSchema, type SheetLeakage } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { sheetKeys } from '../../../lib/sheets/sheet-keys';

/** `GET /api/sheets/:id/leakage`: off-state leakage per device and in total over temperature, against the sheet's budget. */
export const getSheetLeakage = (sheetId: string, signal?: AbortSignal): Promise<SheetLeakage> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/leakage`, { schema: sheetLeakageSchema, signal });

/** Under the sheet's own key: device writes and budget changes refresh it. */
export const sheetLeakageQueryOptions = (sheetId: string) =>
  queryOptions({ queryKey: [...sheetKeys.detail(sheetId), 'leakage'] as const, queryFn: ({ signal }) => getSheetLeakage(sheetId, signal) });

export const useSheetLeakage = (sheetId: string) => useQuery(sheetLeakageQueryOptions(sheetId));
