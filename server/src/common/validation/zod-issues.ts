import type { Problem } from '@channelwright/shared/schemas';
import type { ZodError } from 'zod';
import { DomainError } from '../errors/domain-error.js';

/** A zod failure as the API reports it: 400 VALIDATION_FAILED naming the first bad field, with every problem listed. */
export function validationError(error: ZodError): DomainError {
  const problems: Problem[] = error.issues.map((issue) => ({
    field: issue.path.length > 0 ? issue.path.map(String).join('.') : undefined,
    message: issue.message,
  }));
  const first = problems[0] ?? { message: 'The request is not valid' };
  return new DomainError('VALIDATION_FAILED', first.message, 400, first.field, problems);
}
