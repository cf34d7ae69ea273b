import { sheetSchema, type Sheet } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { sheetQueryOptions } from './get-sheet';

/** `POST /api/sheets/:id/recompute`: every device again with this engine on the sheet's process version. */
export const recomputeSheet = (sheetId: string): Promise<Sheet> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/recompute`, { method: 'POST', schema: sheetSchema });

export function useRecomputeSheet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recomputeSheet,
    onSuccess: (sheet) => queryClient.setQueryData(sheetQueryOptions(sheet.id).queryKey, sheet),
  });
}
