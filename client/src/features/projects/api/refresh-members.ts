import { useQueryClient } from '@tanstack/react-query';
import { projectQueryOptions } from '../../../lib/projects/project';
import { membersQueryOptions } from './get-members';

/** After any member change: re-read the members and the project (its member count, your role). */
export function useRefreshMembers(projectId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: membersQueryOptions(projectId).queryKey }),
      queryClient.invalidateQueries({ queryKey: projectQueryOptions(projectId).queryKey }),
    ]);
}

export const membersPath = (projectId: string, userId?: string) =>
  `/projects/${encodeURIComponent(projectId)}/members${userId ? `/${encodeURIComponent(userId)}` : ''}`;
