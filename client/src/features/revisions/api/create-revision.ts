import { revisionSchema, type Revision } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { revisionKeys } from './revision-keys';

export interface CreateRevisionInput {
  sheetId: string;
  message: string;
}

/** `POST /api/sheets/:id/revisions`: freezes the sheet as its next revision. */
export const createRevision = ({ sheetId, message }: CreateRevisionInput): Promise<Revision> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/revisions`, { method: 'POST', body: { message }, schema: revisionSchema, quiet: true });

export function useCreateRevision() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRevision,
    onSuccess: (_revision, { sheetId }) => queryClient.invalidateQueries({ queryKey: revisionKeys.sheetState(sheetId) }),
  });
}
