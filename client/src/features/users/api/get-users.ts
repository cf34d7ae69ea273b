import { userSchema, type User } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';

const usersSchema = z.array(userSchema);

/** `GET /api/users` (administrators). */
export const getUsers = (signal?: AbortSignal): Promise<User[]> =>
  apiRequest('/users', { schema: usersSchema, signal });

export const usersQueryOptions = () =>
  queryOptions({
    queryKey: ['users'] as const,
    queryFn: ({ signal }) => getUsers(signal),
  });

export const useUsers = () => useQuery(usersQueryOptions());
