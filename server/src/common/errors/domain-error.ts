import type { ErrorCode, Problem } from '@channelwright/shared/schemas';

/**
 * A rule of the product said no. Services throw it with a stable string code; the one exception
 * filter turns it into `{ statusCode, code, message, field?, problems? }`.
 */
export class DomainError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly status = 400,
    readonly field?: string,
    readonly problems?: Problem[],
  ) {
    super(message);
    this.name = 'DomainError';
  }
}

export const badRequest = (code: ErrorCode, message: string, field?: string) => new DomainError(code, message, 400, field);
export const unauthorized = (code: ErrorCode, message: string) => new DomainError(code, message, 401);
export const forbidden = (code: ErrorCode, message: string) => new DomainError(code, message, 403);
export const notFound = (code: ErrorCode, message: string) => new DomainError(code, message, 404);
export const conflict = (code: ErrorCode, message: string, field?: string) => new DomainError(code, message, 409, field);
