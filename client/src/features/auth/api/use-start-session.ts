import type { AuthResponse } from '@channelwright/shared/schemas';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { setAuthToken } from '../../../lib/session/auth-token';
import { currentUserQueryOptions } from '../../../lib/session/current-user';

/** Keeps the new token and the user it belongs to, so the shell needs no second round trip. */
export function useStartSession() {
  const queryClient = useQueryClient();
  return useCallback(
    ({ accessToken, user }: AuthResponse) => {
      setAuthToken(accessToken);
      queryClient.setQueryData(currentUserQueryOptions().queryKey, user);
    },
    [queryClient],
  );
}
