import { processVersionSummarySchema, type ProcessVersionSummary } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import { processKeys } from '../../../lib/processes/process-keys';

const versionsSchema = z.array(processVersionSummarySchema);

/** `GET /api/processes/:id/versions`: every version, newest first. */
export const getProcessVersions = (id: string, signal?: AbortSignal): Promise<ProcessVersionSummary[]> =>
  apiRequest(`/processes/${encodeURIComponent(id)}/versions`, { schema: versionsSchema, signal });

export const processVersionsQueryOptions = (id: string) =>
  queryOptions({ queryKey: processKeys.versions(id), queryFn: ({ signal }) => getProcessVersions(id, signal) });

export const useProcessVersions = (id: string) => useQuery(processVersionsQueryOptions(id));
