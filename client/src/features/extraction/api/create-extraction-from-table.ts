import { type Extraction, type ExtractionFromTableRequestInput, extractionSchema } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** `POST /api/extractions/from-table`: a fit of a version's characterised table. Quiet: a refusal is shown beside the form, naming its field. */
export const createExtractionFromTable = (request: ExtractionFromTableRequestInput): Promise<Extraction> =>
  apiRequest('/extractions/from-table', { method: 'POST', body: request, schema: extractionSchema, quiet: true });

export const useCreateExtractionFromTable = () => useMutation({ mutationFn: createExtractionFromTable });
