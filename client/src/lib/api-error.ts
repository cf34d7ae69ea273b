import { apiErrorBodySchema, type ApiErrorBody, type ErrorCode, type Problem } from '@channelwright/shared/schemas';
import type { ClientErrorCode } from './error-titles';

/** The body of a failure as the client holds it: the server's, or one the client made up for a missing answer. */
type ClientErrorBody = Omit<ApiErrorBody, 'code'> & { code: ErrorCode | ClientErrorCode };

/** A failed API call, carrying the server's error body (or a stand-in when there was none). */
export class ApiError extends Error {
  readonly status: number;
  readonly code: ErrorCode | ClientErrorCode;
  readonly field?: string;
  readonly problems?: Problem[];

  constructor(body: ClientErrorBody) {
    super(body.message);
    this.name = 'ApiError';
    this.status = body.statusCode;
    this.code = body.code;
    this.field = body.field;
    this.problems = body.problems;
  }

  /** Reads the server's `{ statusCode, code, message, field? }`, tolerating bodies that are not. */
  static fromResponseBody(status: number, body: unknown): ApiError {
    const parsed = apiErrorBodySchema.safeParse(body);
    if (parsed.success) return new ApiError(parsed.data);
    return new ApiError({
      statusCode: status,
      code: 'UNEXPECTED_RESPONSE',
      message: `The server answered ${status} without an explanation.`,
    });
  }

  static network(cause: unknown): ApiError {
    const error = new ApiError({
      statusCode: 0,
      code: 'NETWORK_ERROR',
      message: 'The server could not be reached. Check your connection and try again.',
    });
    error.cause = cause;
    return error;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}
