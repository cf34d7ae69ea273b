import { userSchema, type UpdateUserRequest, type User } from '@channelwright/shared/schemas';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { usersQueryOptions } from './get-users';

export interface UpdateUserInput {
  id: string;
  changes: UpdateUserRequest;
}

/** `PATCH /api/users/:id` (administrators): role, disabled, process maintainer. */
export const updateUser = ({ id, changes }: UpdateUserInput): Promise<User> =>
  apiRequest(`/users/${encodeURIComponent(id)}`, { method: 'PATCH', body: changes, schema: userSchema });

/** Shows the change at once, puts the old list back if the server refuses, then re-reads the list. */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  const { queryKey } = usersQueryOptions();
  return useMutation({
    mutationFn: updateUser,
    onMutate: async ({ id, changes }) => {
      await queryClient.cancelQueries({ queryKey });
      const previous = queryClient.getQueryData(queryKey);
      queryClient.setQueryData(queryKey, (users) => users?.map((u) => (u.id === id ? { ...u, ...changes } : u)));
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) queryClient.setQueryData(queryKey, context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey }),
  });
}
