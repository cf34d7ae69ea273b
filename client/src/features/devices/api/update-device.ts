import { deviceSchema, type Device, type UpdateDeviceRequestInput } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invalidateSheet } from '../../../lib/sheets/sheet-changed';

export interface UpdateDeviceInput {
  sheetId: string;
  deviceId: string;
  /** `version` is the one the designer edited: a newer stored one answers 409 STALE_EDIT. */
  changes: UpdateDeviceRequestInput;
}

/** `PATCH /api/sheets/:id/devices/:deviceId`; quiet, because the device page shows a refusal beside its field. */
export const updateDevice = ({ sheetId, deviceId, changes }: UpdateDeviceInput): Promise<Device> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/devices/${encodeURIComponent(deviceId)}`, { method: 'PATCH', body: changes, schema: deviceSchema, quiet: true });

export function useUpdateDevice() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateDevice,
    onSuccess: (_device, { sheetId }) => invalidateSheet(queryClient, sheetId),
  });
}
