import { processProfileSchema, type ProcessProfile } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/processes/:id?version=`: one version in full, for its corners, flavours and ranges. */
export const getProcessProfile = (id: string, version: number, signal?: AbortSignal): Promise<ProcessProfile> =>
  apiRequest(`/processes/${encodeURIComponent(id)}?version=${version}`, { schema: processProfileSchema, signal });

/** A stored version never changes, so it is read once. */
export const processProfileQueryOptions = (id: string, version: number) =>
  queryOptions({
    queryKey: ['workbench', 'process-profile', id, version] as const,
    queryFn: ({ signal }) => getProcessProfile(id, version, signal),
    staleTime: Infinity,
  });

export const useProcessProfile = (id: string | undefined, version: number | undefined) =>
  useQuery({ ...processProfileQueryOptions(id ?? '', version ?? 0), enabled: id !== undefined && version !== undefined });
