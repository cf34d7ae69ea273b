import { revisionDiffSchema, type RevisionDiff } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { revisionKeys } from './revision-keys';

/** `GET /api/revisions/:id/diff?against=`: against the last signed-off revision when `against` is absent. */
export const getRevisionDiff = (id: string, against: string | undefined, signal?: AbortSignal): Promise<RevisionDiff> =>
  apiRequest(`/revisions/${encodeURIComponent(id)}/diff${against ? `?against=${encodeURIComponent(against)}` : ''}`, { schema: revisionDiffSchema, signal });

export const revisionDiffQueryOptions = (id: string, against?: string) =>
  queryOptions({ queryKey: revisionKeys.diff(id, against), queryFn: ({ signal }) => getRevisionDiff(id, against, signal) });

export const useRevisionDiff = (id: string, against?: string) => useQuery(revisionDiffQueryOptions(id, against));
