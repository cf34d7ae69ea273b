import { characterisationJobSchema, type CharacterisationJob } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { characterisationKeys } from '../../../lib/characterisation/characterisation-keys';

/** `DELETE /api/characterisations/:id` (maintainers): the job cancelled, nothing of it kept. */
export const cancelCharacterisation = (id: string): Promise<CharacterisationJob> =>
  apiRequest(`/characterisations/${encodeURIComponent(id)}`, { method: 'DELETE', schema: characterisationJobSchema });

export function useCancelCharacterisation(processId: string, version: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cancelCharacterisation,
    onSettled: () => queryClient.invalidateQueries({ queryKey: characterisationKeys.ofVersion(processId, version) }),
  });
}
