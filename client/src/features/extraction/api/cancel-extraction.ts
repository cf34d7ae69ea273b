import { type Extraction, extractionSchema } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { extractionKeys } from './extraction-keys';

/** `DELETE /api/extractions/:id`: stops a queued or running fit. */
export const cancelExtraction = (id: string): Promise<Extraction> => apiRequest(`/extractions/${id}`, { method: 'DELETE', schema: extractionSchema });

export function useCancelExtraction() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: cancelExtraction, onSuccess: (extraction) => queryClient.setQueryData(extractionKeys.detail(extraction.id), extraction) });
}
