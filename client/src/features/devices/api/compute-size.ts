import { sizeResponseSchema, type SizeRequestInput, type SizeResponse } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { isApiError } from '../../../lib/api-error';

/** How often a device waiting for a table is sized again, ms. */
export const TABLE_WAIT_REFRESH_MS = 5000;

/** `POST /api/compute/size`; quiet, because the device form shows a refusal beside its field. */
export const computeSize = (request: SizeRequestInput, signal?: AbortSignal): Promise<SizeResponse> =>
  apiRequest('/compute/size', { method: 'POST', body: request, schema: sizeResponseSchema, quiet: true, signal });

/** Results are a pure function of the request (and of the version's tables), so the request itself is the key. */
export const sizeQueryOptions = (request: SizeRequestInput | null) =>
  queryOptions({
    queryKey: ['compute', 'size', request] as const,
    queryFn: ({ signal }) => computeSize(request as SizeRequestInput, signal),
    enabled: request !== null,
    staleTime: Infinity,
    placeholderData: keepPreviousData,
    // A device waiting for its table (a characterisation under way) asks again until the table is there.
    refetchInterval: (query) => (isApiError(query.state.error) && query.state.error.code === 'TABLE_NOT_READY' ? TABLE_WAIT_REFRESH_MS : false),
  });
