import { REVIEWING_PROJECT_ROLES, type ProjectMember } from '@channelwright/shared/schemas';
import { useQuery } from '@tanstack/react-query';
import { membersQueryOptions } from '../../../lib/projects/members';

const mayReview = (members: ProjectMember[]) => members.filter((member) => REVIEWING_PROJECT_ROLES.includes(member.role));

/**
 * The project's members who may review (reviewer or owner role), read from the project's member list,
 * so a member just added or given the reviewer role is offered at once. The server refuses the author
 * (SELF_REVIEW) whatever the list offers; the dialog leaves them out too.
 */
export const useReviewerCandidates = (projectId: string | undefined) =>
  useQuery({ ...membersQueryOptions(projectId ?? ''), enabled: projectId !== undefined, select: mayReview });
