import { sheetListSchema, type SheetList } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import { sheetKeys } from './sheet-keys';

/** `GET /api/projects/:id/sheets`: the project's sheets, by name, with their device and stale counts. */
export const getProjectSheets = (projectId: string, signal?: AbortSignal): Promise<SheetList> =>
  apiRequest(`/projects/${encodeURIComponent(projectId)}/sheets`, { schema: sheetListSchema, signal });

/** Under the sheets' keys, so every change to a device (which moves these counts) refreshes it. */
export const projectSheetsQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: sheetKeys.list(projectId), queryFn: ({ signal }) => getProjectSheets(projectId, signal), enabled: projectId !== '' });

export const useProjectSheets = (projectId: string) => useQuery(projectSheetsQueryOptions(projectId));
