import { processProfileSchema, type CreateProcessRequest, type ProcessProfile } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { processKeys } from '../../../lib/processes/process-keys';

/** `POST /api/processes` (maintainers). Quiet: the editor shows a refusal beside its fields. */
export const createProcess = (request: CreateProcessRequest): Promise<ProcessProfile> =>
  apiRequest('/processes', { method: 'POST', body: request, schema: processProfileSchema, quiet: true });

export function useCreateProcess() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createProcess, onSuccess: () => queryClient.invalidateQueries({ queryKey: processKeys.all }) });
}
