import type { SweepRequestInput } from '@channelwright/shared/schemas';
import { useQuery } from '@tanstack/react-query';
import { sweepQueryOptions } from '../api/compute-sweep';
import { useStableValue } from '../hooks/use-stable-value';

/** One sweep for a chart; the previous curves stay while the next ones are computed. */
export function useSweep(request: SweepRequestInput | null) {
  return useQuery(sweepQueryOptions(useStableValue(request)));
}
