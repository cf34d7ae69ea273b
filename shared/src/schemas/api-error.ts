import { z } from 'zod';

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
  code: z.string(),
  message: z.string(),
  field: z.string().optional(),
  problems: z.array(problemSchema).optional(),
});
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;

/** Codes shared by every feature; features add their own (e.g. SHEET_SIGNED_OFF). */
export const COMMON_ERROR_CODES = [
  'VALIDATION_FAILED',
  'UNAUTHENTICATED',
  'INVALID_CREDENTIALS',
  'ACCOUNT_DISABLED',
  'FORBIDDEN',
  'NOT_FOUND',
  'ROUTE_NOT_FOUND',
  'CONFLICT',
  'STALE_EDIT',
  'EMAIL_TAKEN',
  'SIGNUP_DISABLED',
  'TOO_MANY_REQUESTS',
  'PAYLOAD_TOO_LARGE',
  'INTERNAL_ERROR',
] as const;
export type CommonErrorCode = (typeof COMMON_ERROR_CODES)[number];
