import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { subscribeAuthToken } from './auth-token';

/** Whenever the token changes (sign-in, sign-out, expiry, another tab), forget the old user's data. */
export function useResetCacheOnSessionChange(): void {
  const queryClient = useQueryClient();
  useEffect(() => subscribeAuthToken(() => queryClient.clear()), [queryClient]);
}
