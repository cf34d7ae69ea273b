import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invalidateSheet } from '../../../lib/sheets/sheet-changed';

export interface DeleteDeviceInput {
  sheetId: string;
  deviceId: string;
  /** The version shown: deleting a device someone changed meanwhile answers 409. */
  version: number;
}

/** `DELETE /api/sheets/:id/devices/:deviceId?version=`. */
export const deleteDevice = ({ sheetId, deviceId, version }: DeleteDeviceInput): Promise<void> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/devices/${encodeURIComponent(deviceId)}?version=${version}`, { method: 'DELETE' });

export function useDeleteDevice() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteDevice,
    onSettled: (_result, _error, { sheetId }) => invalidateSheet(queryClient, sheetId),
  });
}
