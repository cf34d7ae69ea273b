import { revisionCommentSchema, type RevisionComment } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import { revisionKeys } from './revision-keys';

const commentsSchema = z.array(revisionCommentSchema);

/** `GET /api/revisions/:id/comments`: oldest first. */
export const getRevisionComments = (revisionId: string, signal?: AbortSignal): Promise<RevisionComment[]> =>
  apiRequest(`/revisions/${encodeURIComponent(revisionId)}/comments`, { schema: commentsSchema, signal });

export const revisionCommentsQueryOptions = (revisionId: string) =>
  queryOptions({ queryKey: revisionKeys.comments(revisionId), queryFn: ({ signal }) => getRevisionComments(revisionId, signal) });

export const useRevisionComments = (revisionId: string) => useQuery(revisionCommentsQueryOptions(revisionId));
