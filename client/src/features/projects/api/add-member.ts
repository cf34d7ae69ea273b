import { projectMemberSchema, type AddMemberRequest, type ProjectMember } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { membersPath } from '../../../lib/projects/members';
import { useRefreshMembers } from './refresh-members';

/** `POST /api/projects/:id/members` (owners), by the e-mail of an existing account. Quiet: the form shows the refusal beside the e-mail. */
export const addMember = ({ projectId, request }: { projectId: string; request: AddMemberRequest }): Promise<ProjectMember> =>
  apiRequest(membersPath(projectId), { method: 'POST', body: request, schema: projectMemberSchema, quiet: true });

export const useAddMember = (projectId: string) => useMutation({ mutationFn: addMember, onSuccess: useRefreshMembers(projectId) });
