import { processDiffSchema, type ProcessDiff } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { processKeys } from '../../../lib/processes/process-keys';

/** `GET /api/processes/:id/diff?from=&to=`: which values changed between two versions. */
export const getProcessDiff = (id: string, from: number, to: number, signal?: AbortSignal): Promise<ProcessDiff> =>
  apiRequest(`/processes/${encodeURIComponent(id)}/diff?from=${from}&to=${to}`, { schema: processDiffSchema, signal });

export const processDiffQueryOptions = (id: string, from: number, to: number) =>
  queryOptions({
    queryKey: processKeys.diff(id, from, to),
    queryFn: ({ signal }) => getProcessDiff(id, from, to, signal),
    // Versions never change: a diff once read stays right.
    staleTime: Infinity,
  });

export const useProcessDiff = (id: string, from: number, to: number, enabled = true) =>
  useQuery({ ...processDiffQueryOptions(id, from, to), enabled });
