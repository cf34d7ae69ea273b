import { type Extraction, extractionSchema } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { extractionKeys } from './extraction-keys';

/** How often a queued or running fit is asked for its progress, ms. */
export const PROGRESS_POLL_MS = 1000;

export const isRunning = (extraction: Pick<Extraction, 'status'> | undefined) => extraction?.status === 'queued' || extraction?.status === 'running';

export const getExtraction = (id: string, signal?: AbortSignal): Promise<Extraction> => apiRequest(`/extractions/${id}`, { schema: extractionSchema, signal });

/** `GET /api/extractions/:id`, asked again every second while the fit runs. */
export const extractionQueryOptions = (id: string) =>
  queryOptions({
    queryKey: extractionKeys.detail(id),
    queryFn: ({ signal }) => getExtraction(id, signal),
    refetchInterval: (query) => (isRunning(query.state.data) ? PROGRESS_POLL_MS : false),
  });

export const useExtraction = (id: string) => useQuery(extractionQueryOptions(id));
