import { processProfileSchema, type ProcessProfile, type UpdateProcessRequest } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invalidateMovedProfile } from './profile-moved';

export interface UpdateProcessInput {
  id: string;
  request: UpdateProcessRequest;
}

/** `PUT /api/processes/:id` (maintainers): a new version; 409 STALE_EDIT when someone saved first. Quiet: the editor shows it. */
export const updateProcess = ({ id, request }: UpdateProcessInput): Promise<ProcessProfile> =>
  apiRequest(`/processes/${encodeURIComponent(id)}`, { method: 'PUT', body: request, schema: processProfileSchema, quiet: true });

export function useUpdateProcess() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateProcess, onSuccess: () => invalidateMovedProfile(queryClient) });
}
