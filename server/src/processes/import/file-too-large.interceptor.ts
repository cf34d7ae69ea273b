import { MODEL_CARD_MAX_BYTES, PROCESS_IMPORT_MAX_BYTES } from '@channelwright/shared/schemas';
import { Injectable, PayloadTooLargeException, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import { catchError, type Observable, throwError } from 'rxjs';
import { DomainError } from '../../common/errors/domain-error.js';

/** Wraps the upload: multer's "file too large" (above the card limit, the larger one) becomes 413 PAYLOAD_TOO_LARGE naming the field and the limits. */
@Injectable()
export class FileTooLargeInterceptor implements NestInterceptor {
  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next.handle().pipe(
      catchError((error: unknown) =>
        throwError(() =>
          error instanceof PayloadTooLargeException
            ? new DomainError(
                'PAYLOAD_TOO_LARGE',
                `The file is larger than ${MODEL_CARD_MAX_BYTES / 1024 / 1024} MB (a model card may have ${MODEL_CARD_MAX_BYTES / 1024 / 1024} MB, a process file ${PROCESS_IMPORT_MAX_BYTES / 1024 / 1024} MB); nothing was stored`,
                413,
                'file',
              )
            : error,
        ),
      ),
    );
  }
}
