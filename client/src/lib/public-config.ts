import { publicConfigSchema, type PublicConfig } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from './api-client';

export const getPublicConfig = (signal?: AbortSignal): Promise<PublicConfig> =>
  apiRequest('/config', { schema: publicConfigSchema, anonymous: true, signal });

/** What the server says about itself before anyone signs in (`GET /api/config`). */
export const publicConfigQueryOptions = () =>
  queryOptions({
    queryKey: ['public-config'] as const,
    queryFn: ({ signal }) => getPublicConfig(signal),
    staleTime: Infinity,
  });

export const usePublicConfig = () => useQuery(publicConfigQueryOptions());
