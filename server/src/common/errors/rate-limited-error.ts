import { DomainError } from './domain-error.js';

/** 429 TOO_MANY_REQUESTS with the seconds to wait, which the exception filter sends as Retry-After. */
export class RateLimitedError extends DomainError {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super('TOO_MANY_REQUESTS', message, 429);
  }
}
