import { z } from 'zod';
import { problemSchema } from './api-error.js';

/** Largest CSV POST /api/sheets/:id/import reads: 1 MB (a larger file answers 413 and nothing is stored). */
export const SHEET_IMPORT_MAX_BYTES = 1024 * 1024;

const flag = (field: string) =>
  z
    .enum(['true', 'false'], { error: `${field} must be "true" or "false"` })
    .transform((text) => text === 'true');

/**
 * The text fields of POST /api/sheets/:id/import (multipart, beside the CSV `file`): preview (default)
 * reads the file and writes nothing; apply writes every row in one transaction, and a file with any row in
 * error applies nothing unless onlyValid is "true" (then the good rows are applied and the others listed).
 */
export const sheetImportFieldsSchema = z.strictObject({
  mode: z.enum(['preview', 'apply'], { error: 'mode must be "preview" or "apply"' }).default('preview'),
  onlyValid: flag('onlyValid').default(false),
});
export type SheetImportFields = z.infer<typeof sheetImportFieldsSchema>;

const rowRefSchema = z.object({ row: z.number().int().describe('Line in the file (the header is the first line that is not a # comment)'), name: z.string() });

export const sheetImportResultSchema = z.object({
  mode: z.enum(['preview', 'apply']),
  applied: z.boolean().describe('Whether anything was written'),
  delimiter: z.enum([',', ';']),
  created: z.array(rowRefSchema).describe('Rows that add a device'),
  updated: z.array(rowRefSchema.extend({ deviceId: z.string() })).describe('Rows that update the device of that name'),
  problems: z.array(problemSchema).describe('Rows in error, by row and field (the column title)'),
  ignoredColumns: z.array(z.string()).describe('Columns the import does not read (results, unknown titles)'),
});
export type SheetImportResult = z.infer<typeof sheetImportResultSchema>;
