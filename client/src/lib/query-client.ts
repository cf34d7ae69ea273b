import { QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-error';

const MAX_RETRIES = 1;

/** Retry only what may succeed a second time: lost connections and server faults, never a 4xx. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (failureCount >= MAX_RETRIES) return false;
  return !isApiError(error) || error.status === 0 || error.status >= 500;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
}
