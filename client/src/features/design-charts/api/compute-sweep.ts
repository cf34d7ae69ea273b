import { pointsOfColumns, sweepColumnsResponseSchema, type SweepColumnsResponse, type SweepRequestInput, type SweepResponse } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { useStableValue } from '../../../lib/use-stable-value';

/**
 * `POST /api/compute/sweep`; a chart shows its own refusal, so no notification. Asked for in the columns layout (an
 * array per field: about half the bytes, and checked faster), then turned into the points the charts draw.
 */
export const computeSweep = async (request: SweepRequestInput, signal?: AbortSignal): Promise<SweepResponse> => {
  const answer = (await apiRequest('/compute/sweep', { method: 'POST', body: { ...request, layout: 'columns' }, schema: sweepColumnsResponseSchema, quiet: true, signal })) as SweepColumnsResponse;
  return pointsOfColumns(answer);
};

/** Curves are a pure function of the request, so the request itself is the key and they never go stale. */
export const sweepQueryOptions = (request: SweepRequestInput | null) =>
  queryOptions({
    queryKey: ['compute', 'sweep', request] as const,
    queryFn: ({ signal }) => computeSweep(request as SweepRequestInput, signal),
    enabled: request !== null,
    staleTime: Infinity,
    placeholderData: keepPreviousData,
  });

/** One sweep for a chart; the previous curves stay while the next ones are computed. */
export function useSweep(request: SweepRequestInput | null) {
  return useQuery(sweepQueryOptions(useStableValue(request)));
}
