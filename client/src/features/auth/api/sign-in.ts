import { authResponseSchema, type AuthResponse, type LoginRequest } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { useStartSession } from './use-start-session';

/** `POST /api/auth/login`. The form shows its own error, so the request stays quiet. */
export const signIn = (body: LoginRequest): Promise<AuthResponse> =>
  apiRequest('/auth/login', { method: 'POST', body, schema: authResponseSchema, anonymous: true, quiet: true });

export function useSignIn() {
  const startSession = useStartSession();
  return useMutation({ mutationFn: signIn, onSuccess: startSession });
}
