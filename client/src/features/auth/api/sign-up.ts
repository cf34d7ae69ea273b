import { authResponseSchema, type AuthResponse, type RegisterRequest } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { useStartSession } from './use-start-session';

/** `POST /api/auth/register`: creates the account and signs it in. */
export const signUp = (body: RegisterRequest): Promise<AuthResponse> =>
  apiRequest('/auth/register', { method: 'POST', body, schema: authResponseSchema, anonymous: true, quiet: true });

export function useSignUp() {
  const startSession = useStartSession();
  return useMutation({ mutationFn: signUp, onSuccess: startSession });
}
