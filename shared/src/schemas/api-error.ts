import { z } from 'zod';
import { ERROR_CODES } from './error-codes.js';

/** One problem in a request or an uploaded file, located by field (and row, for files). */
export const problemSchema = z.object({
  field: z.string().optional(),
  row: z.number().int().optional(),
  message: z.string(),
});
export type Problem = z.infer<typeof problemSchema>;

/**
 * The one error body the API sends for every failure: a stable string `code` for programs,
 * a sentence for people, and the offending `field` when there is one.
 */
export const apiErrorBodySchema = z.object({
  statusCode: z.number().int(),
  code: z.enum(ERROR_CODES),
  message: z.string(),
  field: z.string().optional(),
  problems: z.array(problemSchema).optional(),
});
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;

