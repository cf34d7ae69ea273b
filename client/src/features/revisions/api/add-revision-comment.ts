import { revisionCommentSchema, type CreateCommentRequest, type RevisionComment } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { revisionKeys } from './revision-keys';

export interface AddCommentArgs {
  revisionId: string;
  comment: CreateCommentRequest;
}

/** `POST /api/revisions/:id/comments`: on the whole revision, or on one of its devices. */
export const addRevisionComment = ({ revisionId, comment }: AddCommentArgs): Promise<RevisionComment> =>
  apiRequest(`/revisions/${encodeURIComponent(revisionId)}/comments`, { method: 'POST', body: comment, schema: revisionCommentSchema, quiet: true });

export function useAddRevisionComment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addRevisionComment,
    onSuccess: (_comment, { revisionId }) => queryClient.invalidateQueries({ queryKey: revisionKeys.comments(revisionId) }),
  });
}
