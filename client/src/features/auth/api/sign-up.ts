import { registerResponseSchema, type RegisterRequest, type RegisterResponse } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { useStartSession } from './use-start-session';

/**
 * `POST /api/auth/register`. The first account of a server is signed in at once; every later one (new or
 * taken address alike) is told to follow the link mailed to it.
 */
export const signUp = (body: RegisterRequest): Promise<RegisterResponse> =>
  apiRequest('/auth/register', { method: 'POST', body, schema: registerResponseSchema, anonymous: true, quiet: true });

export function useSignUp() {
  const startSession = useStartSession();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (answer) => {
      if (answer.status === 'signed-in') startSession(answer);
    },
  });
}
