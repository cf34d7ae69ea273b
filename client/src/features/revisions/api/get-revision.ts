import { revisionSchema, type Revision } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { revisionKeys } from './revision-keys';

/** `GET /api/revisions/:id`: the frozen sheet with its devices, state and sign-off. */
export const getRevision = (id: string, signal?: AbortSignal): Promise<Revision> =>
  apiRequest(`/revisions/${encodeURIComponent(id)}`, { schema: revisionSchema, signal });

export const revisionQueryOptions = (id: string) =>
  queryOptions({ queryKey: revisionKeys.detail(id), queryFn: ({ signal }) => getRevision(id, signal) });

export const useRevision = (id: string) => useQuery(revisionQueryOptions(id));
