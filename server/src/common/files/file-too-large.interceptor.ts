import { Injectable, mixin, PayloadTooLargeException, type CallHandler, type NestInterceptor, type Type } from '@nestjs/common';
import { catchError, type Observable, throwError } from 'rxjs';
import { DomainError } from '../errors/domain-error.js';

/**
 * Wraps an upload: multer's "file too large" becomes 413 PAYLOAD_TOO_LARGE naming the field, with `limits` saying
 * what the route takes ("1 MB", "2 MB for a model card, 1 MB for a process file").
 */
export function fileTooLarge(limits: string): Type<NestInterceptor> {
  @Injectable()
  class FileTooLargeInterceptor implements NestInterceptor {
    intercept(_context: unknown, next: CallHandler): Observable<unknown> {
      return next.handle().pipe(
        catchError((error: unknown) =>
          throwError(() => (error instanceof PayloadTooLargeException ? new DomainError('PAYLOAD_TOO_LARGE', `The file is larger than ${limits}; nothing was stored`, 413, 'file') : error)),
        ),
      );
    }
  }
  return mixin(FileTooLargeInterceptor);
}

/** "1 MB" from a byte count. */
export const megabytes = (bytes: number): string => `${bytes / 1024 / 1024} MB`;
