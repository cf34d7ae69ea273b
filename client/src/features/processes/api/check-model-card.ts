import { modelCardCheckSchema, type ModelCardCheck } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export interface CheckModelCardInput {
  file: File;
  profileId: string;
  version: number;
}

/** `POST /api/processes/model-cards/check` (maintainers): the card parsed and its mapping guessed for the version; nothing stored. */
export function checkModelCard({ file, profileId, version }: CheckModelCardInput): Promise<ModelCardCheck> {
  const body = new FormData();
  body.set('profileId', profileId);
  body.set('version', String(version));
  body.set('file', file, file.name);
  return apiRequest('/processes/model-cards/check', { method: 'POST', body, schema: modelCardCheckSchema, quiet: true });
}

export const useCheckModelCard = () => useMutation({ mutationFn: checkModelCard });
