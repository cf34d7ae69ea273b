import { projectListSchema, type ProjectList } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import { projectKeys } from './project-keys';

/** `GET /api/projects`: the projects the user belongs to (every project for administrators). */
export const getProjects = (signal?: AbortSignal): Promise<ProjectList> =>
  apiRequest('/projects', { schema: projectListSchema, signal });

export const projectsQueryOptions = () =>
  queryOptions({ queryKey: projectKeys.list(), queryFn: ({ signal }) => getProjects(signal) });

export const useProjects = () => useQuery(projectsQueryOptions());
