import { CURVE_FILE_MAX_BYTES } from '@channelwright/shared/schemas';
import { Injectable, PayloadTooLargeException, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import { catchError, type Observable, throwError } from 'rxjs';
import { DomainError } from '../common/errors/domain-error.js';

/** Wraps the upload: multer's "file too large" becomes 413 PAYLOAD_TOO_LARGE naming the field and the limit. */
@Injectable()
export class CurveFileTooLargeInterceptor implements NestInterceptor {
  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const tooLarge = () => new DomainError('PAYLOAD_TOO_LARGE', `The curve file is larger than ${CURVE_FILE_MAX_BYTES / 1024 / 1024} MB; nothing was stored (thin the sweeps)`, 413, 'file');
    return next.handle().pipe(catchError((error: unknown) => throwError(() => (error instanceof PayloadTooLargeException ? tooLarge() : error))));
  }
}
