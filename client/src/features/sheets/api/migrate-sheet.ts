import { sheetMigrationSchema, type MigrateSheetRequestInput, type SheetMigration } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/projects/project-keys';
import { sheetKeys } from '../../../lib/sheets/sheet-keys';

/** `POST /api/sheets/:id/migrate`: the sheet re-solved on another process, previewed or written as a new sheet. */
export const migrateSheet = (sheetId: string, request: MigrateSheetRequestInput): Promise<SheetMigration> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/migrate`, { method: 'POST', body: request, schema: sheetMigrationSchema });

export function useMigrateSheet(sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: MigrateSheetRequestInput) => migrateSheet(sheetId, request),
    onSuccess: (answer) =>
      answer.sheet
        ? Promise.all([queryClient.invalidateQueries({ queryKey: sheetKeys.lists() }), queryClient.invalidateQueries({ queryKey: projectKeys.detail(answer.sheet.projectId) }), queryClient.invalidateQueries({ queryKey: projectKeys.list() })])
        : undefined,
  });
}
