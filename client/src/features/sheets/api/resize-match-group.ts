import { matchGroupResizeSchema, type MatchGroupResize, type MatchGroupResizeRequestInput } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invalidateSheet } from '../../../lib/sheets/sheet-changed';

/** `POST /api/sheets/:id/match-groups/resize`: the plan (apply: false), or the plan written (apply: true with the plan's versions). */
export const resizeMatchGroup = (sheetId: string, request: MatchGroupResizeRequestInput): Promise<MatchGroupResize> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/match-groups/resize`, { method: 'POST', body: request, schema: matchGroupResizeSchema, quiet: true });

export function useResizeMatchGroup(sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: MatchGroupResizeRequestInput) => resizeMatchGroup(sheetId, request),
    onSuccess: (answer) => (answer.applied ? invalidateSheet(queryClient, sheetId) : undefined),
  });
}
