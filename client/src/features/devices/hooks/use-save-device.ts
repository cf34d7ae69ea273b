import type { Device, DeviceTargetsInput, UpdateDeviceRequestInput } from '@channelwright/shared/schemas';
import { useState } from 'react';
import { isApiError } from '../../../lib/api-error';
import { useCreateDevice } from '../api/create-device';
import { useUpdateDevice } from '../api/update-device';

export type SaveOutcome =
  | { kind: 'idle' }
  | { kind: 'conflict' }
  | { kind: 'refused'; message: string; field?: string };

interface SaveRequest {
  targets: DeviceTargetsInput;
  /** For a stored device: the changes against the version edited. */
  changes?: UpdateDeviceRequestInput;
}

/**
 * Saves the device page: a new device is created, a stored one patched with the version the
 * designer edited. A stale version (409 STALE_EDIT) becomes a conflict the page shows without touching
 * the form; a taken name or any refusal naming a field is shown beside that field.
 */
export function useSaveDevice(sheetId: string, deviceId: string | undefined, onSaved: (device: Device) => void) {
  const create = useCreateDevice();
  const update = useUpdateDevice();
  const [outcome, setOutcome] = useState<SaveOutcome>({ kind: 'idle' });
  // Only a stale version is an edit conflict; a taken name is a refusal beside the name field, fixed by another name.
  const fail = (error: unknown) => {
    if (isApiError(error) && error.code === 'STALE_EDIT') setOutcome({ kind: 'conflict' });
    else if (isApiError(error) && error.code === 'DEVICE_NAME_TAKEN') setOutcome({ kind: 'refused', message: `Name taken: ${error.message}`, field: 'name' });
    else setOutcome({ kind: 'refused', message: error instanceof Error ? error.message : 'The device could not be saved', field: isApiError(error) ? error.field : undefined });
  };
  const succeed = (device: Device) => {
    setOutcome({ kind: 'idle' });
    onSaved(device);
  };

  const save = ({ targets, changes }: SaveRequest) => {
    setOutcome({ kind: 'idle' });
    if (deviceId === undefined) create.mutate({ sheetId, targets, quiet: true }, { onSuccess: succeed, onError: fail });
    else if (changes) update.mutate({ sheetId, deviceId, changes }, { onSuccess: succeed, onError: fail });
  };

  return { save, outcome, saving: create.isPending || update.isPending, clear: () => setOutcome({ kind: 'idle' }) };
}
