import type { ErrorCode } from '@channelwright/shared/schemas';
/**
 * Why a characterisation cannot run or did not finish, with a stable code, a plain sentence (the
 * simulator's own message included when it failed) and the input field when one is to blame. The
 * characterisation service turns it into its DomainError.
 */
export class CharacterisationError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = 'CharacterisationError';
  }
}
