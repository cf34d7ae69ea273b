import { sheetSchema, type Sheet } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/sheets/:id`: the sheet with its devices and totals. */
export const getSheet = (id: string, signal?: AbortSignal): Promise<Sheet> =>
  apiRequest(`/sheets/${encodeURIComponent(id)}`, { schema: sheetSchema, signal });

export const sheetQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['sheets', id] as const, queryFn: ({ signal }) => getSheet(id, signal) });

export const useSheet = (id: string) => useQuery(sheetQueryOptions(id));
