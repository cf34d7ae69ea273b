import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/projects/project-keys';
import { sheetKeys } from '../../../lib/sheets/sheet-keys';

/** `DELETE /api/sheets/:id?version=`: refused (409 SHEET_HAS_REVISIONS) while the sheet has revisions. */
export const deleteSheet = (sheetId: string, version: number): Promise<void> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}?version=${version}`, { method: 'DELETE', quiet: true });

export function useDeleteSheet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ sheetId, version }: { sheetId: string; version: number; projectId: string }) => deleteSheet(sheetId, version),
    onSuccess: (_answer, { sheetId, projectId }) => {
      queryClient.removeQueries({ queryKey: sheetKeys.detail(sheetId) });
      return Promise.all([queryClient.invalidateQueries({ queryKey: sheetKeys.lists() }), queryClient.invalidateQueries({ queryKey: projectKeys.detail(projectId) }), queryClient.invalidateQueries({ queryKey: projectKeys.list() })]);
    },
  });
}
