import { processProfileSchema, type ProcessProfile } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { processKeys } from '../../../lib/processes/process-keys';

/** `GET /api/processes/:id?version=`: a profile with one version in full (the latest when `version` is absent). */
export const getProcess = (id: string, version?: number, signal?: AbortSignal): Promise<ProcessProfile> =>
  apiRequest(`/processes/${encodeURIComponent(id)}${version === undefined ? '' : `?version=${version}`}`, { schema: processProfileSchema, signal });

export const processQueryOptions = (id: string, version?: number) =>
  queryOptions({
    queryKey: processKeys.detail(id, version),
    queryFn: ({ signal }) => getProcess(id, version, signal),
  });

/** An empty id (no profile chosen yet) reads nothing. */
export const useProcess = (id: string, version?: number) => useQuery({ ...processQueryOptions(id, version), enabled: id !== '' });
