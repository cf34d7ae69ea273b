import { sheetSchema, type Sheet } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import { sheetKeys } from './sheet-keys';

/**
 * `GET /api/sheets/:id`: the sheet with its devices and totals. Here in lib because the sheet page and
 * the device page both read it, so they share one cache entry.
 */
export const getSheet = (id: string, signal?: AbortSignal): Promise<Sheet> =>
  apiRequest(`/sheets/${encodeURIComponent(id)}`, { schema: sheetSchema, signal });

export const sheetQueryOptions = (id: string) =>
  queryOptions({ queryKey: sheetKeys.detail(id), queryFn: ({ signal }) => getSheet(id, signal), enabled: id !== '' });

export const useSheet = (id: string) => useQuery(sheetQueryOptions(id));
