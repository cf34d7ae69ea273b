import { projectMemberSchema, type ProjectMember, type ProjectRole } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { membersPath } from '../../../lib/projects/members';
import { useRefreshMembers } from './refresh-members';

/** `PATCH /api/projects/:id/members/:userId` (owners); 409 LAST_OWNER keeps the project owned. */
export const changeMemberRole = ({ projectId, userId, role }: { projectId: string; userId: string; role: ProjectRole }): Promise<ProjectMember> =>
  apiRequest(membersPath(projectId, userId), { method: 'PATCH', body: { role }, schema: projectMemberSchema });

export const useChangeMemberRole = (projectId: string) => useMutation({ mutationFn: changeMemberRole, onSettled: useRefreshMembers(projectId) });
