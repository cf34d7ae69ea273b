import { processProfileSummarySchema, type ListProcessesQuery, type ProcessProfileSummary } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../api-client';
import { processKeys } from './process-keys';

const listSchema = z.array(processProfileSummarySchema);

/**
 * `GET /api/processes`: the latest version of every profile. Here in lib because several features use it
 * (the library page, and every place that offers a process to size in); one query key, so the library's
 * mutations (which invalidate `processKeys.all`) refresh every list.
 */
export function getProcesses(query: Partial<ListProcessesQuery>, signal?: AbortSignal): Promise<ProcessProfileSummary[]> {
  const params = new URLSearchParams();
  if (query.search) params.set('search', query.search);
  if (query.includeDeprecated) params.set('includeDeprecated', 'true');
  const suffix = params.size > 0 ? `?${params}` : '';
  return apiRequest(`/processes${suffix}`, { schema: listSchema, signal });
}

export const processesQueryOptions = (query: Partial<ListProcessesQuery> = {}) =>
  queryOptions({
    queryKey: processKeys.list(query),
    queryFn: ({ signal }) => getProcesses(query, signal),
    placeholderData: keepPreviousData,
  });

/** The profiles to choose from when sizing (latest versions, deprecated ones left out). */
export const useProcessProfiles = () => useQuery(processesQueryOptions());
