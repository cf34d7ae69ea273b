import { projectMemberListSchema, REVIEWING_PROJECT_ROLES, type ProjectMember } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { revisionKeys } from './revision-keys';

/**
 * `GET /api/projects/:id/members`, kept to the members who may review (reviewer or owner role).
 * The server refuses the author (SELF_REVIEW) whatever the list offers; the dialog leaves them out too.
 */
export const getReviewerCandidates = async (projectId: string, signal?: AbortSignal): Promise<ProjectMember[]> => {
  const members = await apiRequest(`/projects/${encodeURIComponent(projectId)}/members`, { schema: projectMemberListSchema, signal });
  return members.filter((member) => REVIEWING_PROJECT_ROLES.includes(member.role));
};

export const reviewerCandidatesQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: revisionKeys.reviewers(projectId), queryFn: ({ signal }) => getReviewerCandidates(projectId, signal) });

export const useReviewerCandidates = (projectId: string | undefined) => useQuery({ ...reviewerCandidatesQueryOptions(projectId ?? ''), enabled: projectId !== undefined });
