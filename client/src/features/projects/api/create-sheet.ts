import { sheetSchema, type CreateSheetRequestInput, type Sheet } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { projectQueryOptions } from '../../../lib/projects/project';
import { projectSheetsQueryOptions } from './get-project-sheets';

export interface CreateSheetInput {
  projectId: string;
  request: CreateSheetRequestInput;
}

/** `POST /api/projects/:id/sheets`: a new, empty sheet on the process version chosen. Quiet: the dialog shows refusals. */
export const createSheet = ({ projectId, request }: CreateSheetInput): Promise<Sheet> =>
  apiRequest(`/projects/${encodeURIComponent(projectId)}/sheets`, { method: 'POST', body: request, schema: sheetSchema, quiet: true });

export function useCreateSheet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSheet,
    onSuccess: (_sheet, { projectId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: projectSheetsQueryOptions(projectId).queryKey }),
        queryClient.invalidateQueries({ queryKey: projectQueryOptions(projectId).queryKey }),
      ]),
  });
}
