import { projectSchema, type Project } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import { projectKeys } from './project-keys';

/**
 * `GET /api/projects/:id`: a project and the caller's role in it. Every page inside a project (its
 * own page, its sheets, their devices) reads the name and the role from here, so they share one cache.
 */
export const getProject = (id: string, signal?: AbortSignal): Promise<Project> =>
  apiRequest(`/projects/${encodeURIComponent(id)}`, { schema: projectSchema, signal });

export const projectQueryOptions = (id: string) =>
  queryOptions({ queryKey: projectKeys.detail(id), queryFn: ({ signal }) => getProject(id, signal) });

export const useProject = (id: string | undefined) => useQuery({ ...projectQueryOptions(id ?? ''), enabled: id !== undefined });
