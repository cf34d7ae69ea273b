import { sheetSchema, type Sheet } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { replaceSheet } from '../../../lib/sheets/sheet-changed';

/** `POST /api/sheets/:id/recompute`: every device again with this engine on the sheet's process version. */
export const recomputeSheet = (sheetId: string): Promise<Sheet> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/recompute`, { method: 'POST', schema: sheetSchema });

export function useRecomputeSheet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recomputeSheet,
    onSuccess: (sheet) => replaceSheet(queryClient, sheet),
  });
}
