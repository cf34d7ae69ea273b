import { processProfileSchema, type ProcessProfile } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import { processKeys } from './process-keys';

/**
 * `GET /api/processes/:id?version=`: a profile with one version in full (the latest when `version` is
 * absent). Here in lib because the library pages and every page that sizes in a process read it.
 */
export const getProcess = (id: string, version?: number, signal?: AbortSignal): Promise<ProcessProfile> =>
  apiRequest(`/processes/${encodeURIComponent(id)}${version === undefined ? '' : `?version=${version}`}`, { schema: processProfileSchema, signal });

/**
 * Read like any other query, even for a numbered version: its definition never changes, but the answer
 * also carries the profile's own fields (latest version, deprecated), which do.
 */
export const processQueryOptions = (id: string, version?: number) =>
  queryOptions({ queryKey: processKeys.detail(id, version), queryFn: ({ signal }) => getProcess(id, version, signal) });

/** No id (no profile chosen yet, or the sheet still loading) reads nothing. */
export const useProcess = (id: string | undefined, version?: number) =>
  useQuery({ ...processQueryOptions(id ?? '', version), enabled: id !== undefined && id !== '' });
