import { projectMemberListSchema, type ProjectMemberList } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/projects/:id/members`: owners first, then by name. */
export const getMembers = (projectId: string, signal?: AbortSignal): Promise<ProjectMemberList> =>
  apiRequest(`/projects/${encodeURIComponent(projectId)}/members`, { schema: projectMemberListSchema, signal });

export const membersQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: ['projects', 'members', projectId] as const, queryFn: ({ signal }) => getMembers(projectId, signal) });

export const useMembers = (projectId: string) => useQuery(membersQueryOptions(projectId));
