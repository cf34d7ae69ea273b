import { projectMemberListSchema, type ProjectMemberList } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import { projectKeys } from './project-keys';

export const membersPath = (projectId: string, userId?: string) =>
  `/projects/${encodeURIComponent(projectId)}/members${userId ? `/${encodeURIComponent(userId)}` : ''}`;

/**
 * `GET /api/projects/:id/members`: owners first, then by name. Here in lib because the project page
 * lists them and the review dialog offers the reviewers among them, from the same cache entry.
 */
export const getMembers = (projectId: string, signal?: AbortSignal): Promise<ProjectMemberList> =>
  apiRequest(membersPath(projectId), { schema: projectMemberListSchema, signal });

export const membersQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: projectKeys.members(projectId), queryFn: ({ signal }) => getMembers(projectId, signal) });

export const useMembers = (projectId: string) => useQuery(membersQueryOptions(projectId));
