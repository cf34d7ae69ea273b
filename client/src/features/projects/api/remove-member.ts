import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { membersPath } from '../../../lib/projects/members';
import { useRefreshMembers } from './refresh-members';

/** `DELETE /api/projects/:id/members/:userId` (owners); 409 LAST_OWNER for the last owner. */
export const removeMember = ({ projectId, userId }: { projectId: string; userId: string }): Promise<void> =>
  apiRequest(membersPath(projectId, userId), { method: 'DELETE' });

export const useRemoveMember = (projectId: string) => useMutation({ mutationFn: removeMember, onSettled: useRefreshMembers(projectId) });
