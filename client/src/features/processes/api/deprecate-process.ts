import { processProfileSchema, type ProcessProfile } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invalidateMovedProfile } from './profile-moved';

export interface DeprecateProcessInput {
  id: string;
  deprecated: boolean;
}

/** `POST /api/processes/:id/deprecate` (maintainers); `deprecated: false` restores the profile. */
export const deprecateProcess = ({ id, deprecated }: DeprecateProcessInput): Promise<ProcessProfile> =>
  apiRequest(`/processes/${encodeURIComponent(id)}/deprecate`, { method: 'POST', body: { deprecated }, schema: processProfileSchema });

export function useDeprecateProcess() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deprecateProcess, onSuccess: () => invalidateMovedProfile(queryClient) });
}
