import { authResponseSchema, type AuthResponse, type ConfirmEmailRequest } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { useStartSession } from './use-start-session';

/** `POST /api/auth/confirm`: the mailed link's token and the password chosen at sign-up; signs the account in. */
export const confirmEmail = (body: ConfirmEmailRequest): Promise<AuthResponse> =>
  apiRequest('/auth/confirm', { method: 'POST', body, schema: authResponseSchema, anonymous: true, quiet: true });

export function useConfirmEmail() {
  const startSession = useStartSession();
  return useMutation({ mutationFn: confirmEmail, onSuccess: startSession });
}
