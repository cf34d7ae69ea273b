import { sheetImportResultSchema, type SheetImportResult } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invalidateSheet } from '../../../lib/sheets/sheet-changed';

export interface ImportRequest {
  file: File;
  mode: 'preview' | 'apply';
  onlyValid?: boolean;
}

/** `POST /api/sheets/:id/import` (multipart): a CSV previewed, or applied in one transaction. */
export function importSheet(sheetId: string, { file, mode, onlyValid = false }: ImportRequest): Promise<SheetImportResult> {
  const body = new FormData();
  body.set('file', file);
  body.set('mode', mode);
  body.set('onlyValid', String(onlyValid));
  return apiRequest(`/sheets/${encodeURIComponent(sheetId)}/import`, { method: 'POST', body, schema: sheetImportResultSchema, quiet: true });
}

export function useImportSheet(sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: ImportRequest) => importSheet(sheetId, request),
    onSuccess: (result) => (result.applied ? invalidateSheet(queryClient, sheetId) : undefined),
  });
}
