import { type ProcessProfile, processProfileSchema, type SaveExtractionRequest } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { processKeys } from '../../../lib/processes/process-keys';
import { extractionKeys } from './extraction-keys';

/** `POST /api/extractions/:id/save` (maintainers): the fit as a new version of its base profile. */
export const saveExtraction = ({ id, request }: { id: string; request: SaveExtractionRequest }): Promise<ProcessProfile> =>
  apiRequest(`/extractions/${id}/save`, { method: 'POST', body: request, schema: processProfileSchema });

/** A saved fit changes the extraction (savedAs) and the process library (a new version). */
export function useSaveExtraction() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveExtraction,
    onSuccess: (_profile, { id }) => Promise.all([queryClient.invalidateQueries({ queryKey: extractionKeys.detail(id) }), queryClient.invalidateQueries({ queryKey: processKeys.all })]),
  });
}
