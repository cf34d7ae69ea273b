import { deviceSchema, type Device, type DeviceTargetsInput } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { invalidateSheet } from '../../../lib/sheets/sheet-changed';

export interface CreateDeviceInput {
  sheetId: string;
  targets: DeviceTargetsInput;
  /** The caller shows a refusal beside its field (the device page) rather than as a notification. */
  quiet?: boolean;
}

/** `POST /api/sheets/:id/devices`: stored with its result (or the engine's refusal). */
export const createDevice = ({ sheetId, targets, quiet }: CreateDeviceInput): Promise<Device> =>
  apiRequest(`/sheets/${encodeURIComponent(sheetId)}/devices`, { method: 'POST', body: targets, schema: deviceSchema, quiet });

export function useCreateDevice() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDevice,
    onSuccess: (_device, { sheetId }) => invalidateSheet(queryClient, sheetId),
  });
}
