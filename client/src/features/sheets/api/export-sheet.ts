import type { ExportQuery } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { saveFile } from '../../../lib/save-file';

export type ExportChoice = Partial<ExportQuery>;

/** `GET /api/sheets/:id/export?format=…`: the sheet as CSV (with # metadata, or the table alone), its metadata, or SPICE lines. */
export const exportSheet = (sheetId: string, choice: ExportChoice): Promise<string> => {
  const query = new URLSearchParams(Object.entries(choice).filter(([, value]) => value !== undefined) as Array<[string, string]>);
  return apiRequest(`/sheets/${encodeURIComponent(sheetId)}/export?${query.toString()}`, { responseType: 'text' });
};

/** A file name from the sheet's name: "Two-stage amplifier" → "Two-stage_amplifier.csv" (".metadata.csv", ".sp"). */
export function exportFileName(sheetName: string, choice: ExportChoice): string {
  const base = sheetName.trim().replace(/[^A-Za-z0-9._-]+/g, '_') || 'sheet';
  if (choice.format === 'spice') return `${base}.sp`;
  if (choice.format === 'csv-metadata') return `${base}.metadata.csv`;
  return `${base}.csv`;
}

/** Fetches the export with the session's token and hands it to the browser as a download. */
export function useExportSheet() {
  return useMutation({
    mutationFn: async ({ sheetId, sheetName, choice = {} }: { sheetId: string; sheetName: string; choice?: ExportChoice }) => {
      const text = await exportSheet(sheetId, choice);
      const type = choice.format === 'spice' ? 'text/plain;charset=utf-8' : 'text/csv;charset=utf-8';
      saveFile(new Blob([text], { type }), exportFileName(sheetName, choice));
    },
  });
}
