import { characterisationJobSchema, type CharacterisationJob, type CharacterisationRequestInput } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { characterisationKeys } from '../../../lib/characterisation/characterisation-keys';

/** `POST /api/characterisations` (maintainers): 202 with a queued job, 200 with the job of the same version and grid. */
export const startCharacterisation = (request: CharacterisationRequestInput): Promise<CharacterisationJob> =>
  apiRequest('/characterisations', { method: 'POST', body: request, schema: characterisationJobSchema, quiet: true });

export function useStartCharacterisation(processId: string, version: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startCharacterisation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: characterisationKeys.ofVersion(processId, version) }),
  });
}
