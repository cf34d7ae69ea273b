import type { ApiErrorBody, ErrorCode } from '@channelwright/shared/schemas';
import { isEngineError } from '@channelwright/shared/device';
import { Catch, HttpException, Logger, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import { ZodError } from 'zod';
import { DomainError } from '../errors/domain-error.js';
import { RateLimitedError } from '../errors/rate-limited-error.js';
import { validationError } from '../validation/zod-issues.js';

/** Codes for the HTTP exceptions Nest and its add-ons raise themselves (our own code throws DomainError). */
const CODE_BY_STATUS: Partial<Record<number, ErrorCode>> = {
  400: 'VALIDATION_FAILED',
  401: 'UNAUTHENTICATED',
  403: 'FORBIDDEN',
  // Features answer a missing resource with a DomainError, so a bare 404 is Nest's "no such route".
  404: 'ROUTE_NOT_FOUND',
  409: 'CONFLICT',
  413: 'PAYLOAD_TOO_LARGE',
  429: 'TOO_MANY_REQUESTS',
};

/** Engine refusals that are not a wrong input but a state of the stored data (the table model has no usable table yet): 409. */
const ENGINE_CONFLICTS: ReadonlySet<ErrorCode> = new Set(['TABLE_NOT_READY', 'TABLE_NOT_CHARACTERISED', 'TABLE_CORRUPT']);

const MESSAGE_BY_STATUS: Partial<Record<number, string>> = {
  401: 'Sign in to continue',
  413: 'The request body is larger than the server accepts',
  429: 'Too many attempts; wait a minute and try again',
};

const INTERNAL_ERROR: ApiErrorBody = {
  statusCode: 500,
  code: 'INTERNAL_ERROR',
  message: 'Something went wrong on the server; the error has been logged',
};

/** Every failure, of any kind, as the one error body of the API. Never exposes a stack or an internal message. */
export function toApiErrorBody(exception: unknown): ApiErrorBody {
  if (exception instanceof DomainError) {
    return withoutUndefined({
      statusCode: exception.status,
      code: exception.code,
      message: exception.message,
      field: exception.field,
      problems: exception.problems,
    });
  }
  if (isEngineError(exception)) {
    return withoutUndefined({ statusCode: ENGINE_CONFLICTS.has(exception.code) ? 409 : 400, code: exception.code, message: exception.message, field: exception.field });
  }
  if (exception instanceof ZodError) return toApiErrorBody(validationError(exception));
  if (exception instanceof HttpException) {
    const status = exception.getStatus();
    if (status >= 500) return INTERNAL_ERROR;
    return {
      statusCode: status,
      // Any other 4xx Nest raises (405, 410…) keeps its status under one listed code.
      code: CODE_BY_STATUS[status] ?? 'REQUEST_REFUSED',
      message: MESSAGE_BY_STATUS[status] ?? exception.message,
    };
  }
  return INTERNAL_ERROR;
}

/** The one exception filter: maps DomainError, EngineError, zod and HTTP errors; logs server faults. */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const body = toApiErrorBody(exception);
    if (body.statusCode >= 500) {
      this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    }
    const response = host.switchToHttp().getResponse<Response>();
    if (response.headersSent) {
      response.end();
      return;
    }
    if (exception instanceof RateLimitedError) response.setHeader('Retry-After', String(Math.max(1, exception.retryAfterSeconds)));
    response.status(body.statusCode).json(body);
  }
}

function withoutUndefined(body: ApiErrorBody): ApiErrorBody {
  return Object.fromEntries(Object.entries(body).filter(([, value]) => value !== undefined)) as ApiErrorBody;
}
