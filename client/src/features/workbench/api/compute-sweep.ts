import { sweepResponseSchema, type SweepRequestInput, type SweepResponse } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** `POST /api/compute/sweep`; a chart shows its own refusal, so no notification. */
export const computeSweep = (request: SweepRequestInput, signal?: AbortSignal): Promise<SweepResponse> =>
  apiRequest('/compute/sweep', { method: 'POST', body: request, schema: sweepResponseSchema, quiet: true, signal }) as Promise<SweepResponse>;

export const sweepQueryOptions = (request: SweepRequestInput | null) =>
  queryOptions({
    queryKey: ['compute', 'sweep', request] as const,
    queryFn: ({ signal }) => computeSweep(request as SweepRequestInput, signal),
    enabled: request !== null,
    staleTime: Infinity,
    placeholderData: keepPreviousData,
  });
