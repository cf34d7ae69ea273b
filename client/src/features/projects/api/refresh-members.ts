import { useQueryClient } from '@tanstack/react-query';
import { projectKeys } from '../../../lib/projects/project-keys';

/**
 * After any member change: the project (your role, its member count) with its members under it, and
 * the home page's list of projects (their member counts; a removed member loses the project).
 */
export function useRefreshMembers(projectId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: projectKeys.detail(projectId) }),
      queryClient.invalidateQueries({ queryKey: projectKeys.list() }),
    ]);
}
