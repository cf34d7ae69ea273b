import { Injectable, PayloadTooLargeException, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import { catchError, type Observable, throwError } from 'rxjs';
import { DomainError } from '../errors/domain-error.js';

/** Every upload the product takes (a process file, a sheet CSV) is at most 1 MB. */
export const UPLOAD_MAX_BYTES = 1024 * 1024;

/** Wraps an upload: multer's "file too large" becomes 413 PAYLOAD_TOO_LARGE naming the field and the limit. */
@Injectable()
export class FileTooLargeInterceptor implements NestInterceptor {
  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next.handle().pipe(
      catchError((error: unknown) =>
        throwError(() =>
          error instanceof PayloadTooLargeException ? new DomainError('PAYLOAD_TOO_LARGE', `The file is larger than ${UPLOAD_MAX_BYTES / 1024 / 1024} MB; nothing was stored`, 413, 'file') : error,
        ),
      ),
    );
  }
}
