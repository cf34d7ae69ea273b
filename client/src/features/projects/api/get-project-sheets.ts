import { sheetListSchema, type SheetList } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/projects/:id/sheets`: the project's sheets, by name. */
export const getProjectSheets = (projectId: string, signal?: AbortSignal): Promise<SheetList> =>
  apiRequest(`/projects/${encodeURIComponent(projectId)}/sheets`, { schema: sheetListSchema, signal });

export const projectSheetsQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: ['projects', 'sheets', projectId] as const, queryFn: ({ signal }) => getProjectSheets(projectId, signal) });

export const useProjectSheets = (projectId: string) => useQuery(projectSheetsQueryOptions(projectId));
