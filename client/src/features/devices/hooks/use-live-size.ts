import type { SizeRequestInput } from '@channelwright/shared/schemas';
import { useDebouncedValue } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { sizeQueryOptions } from '../api/compute-size';
import { useStableValue } from '../../../lib/use-stable-value';

/** Pause after the last keystroke before asking the server, so typing "20u" sends one request. */
export const LIVE_SIZE_DEBOUNCE_MS = 300;

/**
 * Sizes the device as the designer types: the latest valid request, debounced, through the compute
 * API. The previous answer stays on screen while the next one is on its way.
 */
export function useLiveSize(request: SizeRequestInput | null) {
  const stable = useStableValue(request);
  const [debounced] = useDebouncedValue(stable, LIVE_SIZE_DEBOUNCE_MS);
  const query = useQuery(sizeQueryOptions(debounced));
  const settled = debounced === stable && !query.isFetching;
  return { ...query, request: debounced, settled };
}
