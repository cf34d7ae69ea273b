import { processProfileSchema, type ImportProcessFields, type ProcessProfile } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { processKeys } from '../../../lib/processes/process-keys';

export interface ImportProcessInput {
  file: File;
  /** profileId with baseVersion: a new version of that profile; neither: a new profile. */
  fields?: ImportProcessFields;
}

/** `POST /api/processes/import` (maintainers, multipart). Quiet: the problems are listed beside the file. */
export function importProcess({ file, fields = {} }: ImportProcessInput): Promise<ProcessProfile> {
  const body = new FormData();
  for (const [key, value] of Object.entries(fields)) if (value !== undefined) body.set(key, String(value));
  body.set('file', file, file.name);
  return apiRequest('/processes/import', { method: 'POST', body, schema: processProfileSchema, quiet: true });
}

export function useImportProcess() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: importProcess, onSuccess: () => queryClient.invalidateQueries({ queryKey: processKeys.all }) });
}
