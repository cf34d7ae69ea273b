import { projectSchema, type CreateProjectRequestInput, type Project } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/projects/project-keys';

/** `POST /api/projects`: the creator becomes its owner. Quiet: the dialog shows a refusal itself. */
export const createProject = (request: CreateProjectRequestInput): Promise<Project> =>
  apiRequest('/projects', { method: 'POST', body: request, schema: projectSchema, quiet: true });

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.list() }),
  });
}
