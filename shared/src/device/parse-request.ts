import type { z } from 'zod';
import { fieldOfIssue } from '../schemas/field-of-issue.js';
import { EngineError } from './errors.js';

/** Parses with a schema; on failure throws EngineError VALIDATION_FAILED naming the first issue's field. */
export function parseOrThrow<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  const field = fieldOfIssue(issue);
  throw new EngineError('VALIDATION_FAILED', issue.message, field);
}
