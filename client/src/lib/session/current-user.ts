import { userSchema, type User } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import { useAuthToken } from './auth-token';

export const getCurrentUser = (signal?: AbortSignal): Promise<User> =>
  apiRequest('/auth/me', { schema: userSchema, signal });

/** The signed-in user (`GET /api/auth/me`); every feature reads who is signed in from here. */
export const currentUserQueryOptions = () =>
  queryOptions({
    queryKey: ['session', 'current-user'] as const,
    queryFn: ({ signal }) => getCurrentUser(signal),
    staleTime: 5 * 60_000,
  });

export function useCurrentUser() {
  const token = useAuthToken();
  return useQuery({ ...currentUserQueryOptions(), enabled: token !== null });
}

/** For components under the signed-in guard, which only renders once the user is known. */
export function useSignedInUser(): User {
  const { data } = useCurrentUser();
  if (!data) throw new Error('useSignedInUser is used outside the signed-in part of the app');
  return data;
}
