import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { saveFile } from '../../../lib/save-file';

/** `GET /api/sheets/:id/export?format=csv`: the sheet as CSV text, plain SI numbers, units in the header. */
export const exportSheetCsv = (sheetId: string): Promise<string> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/export?format=csv`, { responseType: 'text' });

/** A file name from the sheet's name: "Two-stage amplifier" → "Two-stage_amplifier.csv". */
export const csvFileName = (sheetName: string) => `${sheetName.trim().replace(/[^A-Za-z0-9._-]+/g, '_') || 'sheet'}.csv`;

/** Fetches the export with the session's token and hands it to the browser as a download. */
export function useExportSheet() {
  return useMutation({
    mutationFn: async ({ sheetId, sheetName }: { sheetId: string; sheetName: string }) => {
      const text = await exportSheetCsv(sheetId);
      saveFile(new Blob([text], { type: 'text/csv;charset=utf-8' }), csvFileName(sheetName));
    },
  });
}
