import type { ListProcessesQuery } from '@channelwright/shared/schemas';
import { useQuery } from '@tanstack/react-query';
import { processesQueryOptions } from '../../../lib/processes/process-profiles';

/** `GET /api/processes` for the library page: the fetcher and its query key live in lib/processes. */
export const useProcesses = (query: Partial<ListProcessesQuery> = {}) => useQuery(processesQueryOptions(query));
