import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { processKeys } from '../../../lib/processes/process-keys';

/** `DELETE /api/processes/:id` (maintainers); 409 PROCESS_IN_USE when a sheet points at it (shown as a notification). */
export const deleteProcess = (id: string): Promise<void> => apiRequest(`/processes/${encodeURIComponent(id)}`, { method: 'DELETE' });

export function useDeleteProcess() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deleteProcess, onSuccess: () => queryClient.invalidateQueries({ queryKey: processKeys.all }) });
}
