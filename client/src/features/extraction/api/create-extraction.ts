import { type Extraction, extractionSchema } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** The text fields sent beside the file, as the form holds them (every value text, as multipart sends it). */
export interface CreateExtractionInput {
  file: File;
  fields: {
    processId: string;
    polarity: 'nmos' | 'pmos';
    model: 'all-region' | 'square-law';
    w?: string;
    l?: string;
    temperature?: string;
  };
}

/** `POST /api/extractions` (multipart). Quiet: a refused file's problems are listed beside the form. */
export function createExtraction({ file, fields }: CreateExtractionInput): Promise<Extraction> {
  const body = new FormData();
  for (const [key, value] of Object.entries(fields)) if (value !== undefined && value.trim() !== '') body.set(key, value.trim());
  body.set('file', file, file.name);
  return apiRequest('/extractions', { method: 'POST', body, schema: extractionSchema, quiet: true });
}

export const useCreateExtraction = () => useMutation({ mutationFn: createExtraction });
