import { processProfileSummarySchema, type ProcessProfileSummary } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../api-client';

const summariesSchema = z.array(processProfileSummarySchema);

/**
 * `GET /api/processes`: the library's profiles with their latest version, for choosing what to size
 * in (a new sheet, the scratch workbench). Shared because several features offer that choice.
 */
export const getProcessProfiles = (signal?: AbortSignal): Promise<ProcessProfileSummary[]> =>
  apiRequest('/processes', { schema: summariesSchema, signal });

export const processProfilesQueryOptions = () =>
  queryOptions({ queryKey: ['process-profiles', 'choices'] as const, queryFn: ({ signal }) => getProcessProfiles(signal) });

export const useProcessProfiles = () => useQuery(processProfilesQueryOptions());
