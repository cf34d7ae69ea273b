import { sheetSchema, type CreateSheetRequestInput, type Sheet } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/projects/project-keys';
import { sheetKeys } from '../../../lib/sheets/sheet-keys';

export interface CreateSheetInput {
  projectId: string;
  request: CreateSheetRequestInput;
}

/** `POST /api/projects/:id/sheets`: a new, empty sheet on the process version chosen. Quiet: the dialog shows refusals. */
export const createSheet = ({ projectId, request }: CreateSheetInput): Promise<Sheet> =>
  apiRequest(`/projects/${encodeURIComponent(projectId)}/sheets`, { method: 'POST', body: request, schema: sheetSchema, quiet: true });

/** A new sheet changes the project's sheet list and its sheet count, on the project page and on the home page's list. */
export function useCreateSheet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSheet,
    onSuccess: (_sheet, { projectId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: sheetKeys.list(projectId) }),
        queryClient.invalidateQueries({ queryKey: projectKeys.detail(projectId) }),
        queryClient.invalidateQueries({ queryKey: projectKeys.list() }),
      ]),
  });
}
