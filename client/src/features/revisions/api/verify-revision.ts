import { revisionVerificationSchema, type RevisionVerification } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { revisionKeys } from './revision-keys';

/** `GET /api/revisions/:id/verify`: the hash recomputed from the stored rows against the stored one. */
export const verifyRevision = (id: string, signal?: AbortSignal): Promise<RevisionVerification> =>
  apiRequest(`/revisions/${encodeURIComponent(id)}/verify`, { schema: revisionVerificationSchema, signal });

export const verifyRevisionQueryOptions = (id: string) =>
  queryOptions({ queryKey: revisionKeys.verify(id), queryFn: ({ signal }) => verifyRevision(id, signal), staleTime: 0 });

/** Runs only when asked (enabled), each time afresh. */
export const useVerifyRevision = (id: string, enabled: boolean) => useQuery({ ...verifyRevisionQueryOptions(id), enabled });
