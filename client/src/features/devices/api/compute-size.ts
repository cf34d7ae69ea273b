import { sizeResponseSchema, type SizeRequestInput, type SizeResponse } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** `POST /api/compute/size`; quiet, because the device form shows a refusal beside its field. */
export const computeSize = (request: SizeRequestInput, signal?: AbortSignal): Promise<SizeResponse> =>
  apiRequest('/compute/size', { method: 'POST', body: request, schema: sizeResponseSchema, quiet: true, signal });

/** Results are a pure function of the request, so the request itself is the key and they never go stale. */
export const sizeQueryOptions = (request: SizeRequestInput | null) =>
  queryOptions({
    queryKey: ['compute', 'size', request] as const,
    queryFn: ({ signal }) => computeSize(request as SizeRequestInput, signal),
    enabled: request !== null,
    staleTime: Infinity,
    placeholderData: keepPreviousData,
  });
