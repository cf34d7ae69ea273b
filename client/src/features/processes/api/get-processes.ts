import { processProfileSummarySchema, type ListProcessesQuery, type ProcessProfileSummary } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import { processKeys } from './process-keys';

const listSchema = z.array(processProfileSummarySchema);

/** `GET /api/processes`: the latest version of every profile. */
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

export const useProcesses = (query: Partial<ListProcessesQuery> = {}) => useQuery(processesQueryOptions(query));
