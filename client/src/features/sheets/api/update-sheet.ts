import { sheetSchema, type Sheet, type UpdateSheetRequestInput } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { replaceSheet } from '../../../lib/sheets/sheet-changed';

/** `PATCH /api/sheets/:id`: the sheet's own fields (name, process version, defaults, budgets); 409 STALE_EDIT. */
export const updateSheet = (sheetId: string, change: UpdateSheetRequestInput): Promise<Sheet> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}`, { method: 'PATCH', body: change, schema: sheetSchema, quiet: true });

export function useUpdateSheet(sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: UpdateSheetRequestInput) => updateSheet(sheetId, change),
    onSuccess: (sheet) => replaceSheet(queryClient, sheet),
  });
}
