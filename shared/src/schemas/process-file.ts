import { z } from 'zod';
import { processSchema } from './process.js';
import { messageSchema, nodeClassSchema, versionNumberText } from './process-profile.js';

/**
 * Process files in and out of the library: our own JSON file of one version (what export writes and
 * import reads), the CSV import's columns, and the text fields that come with an upload.
 */

/** Largest file POST /api/processes/import accepts; a bigger one answers 413 PAYLOAD_TOO_LARGE. */
export const PROCESS_IMPORT_MAX_BYTES = 1024 * 1024;

/**
 * The text fields of POST /api/processes/import (multipart, beside the `file`). With profileId and
 * baseVersion the file becomes a new version of that profile; without, a new profile.
 */
export const importProcessFieldsSchema = z
  .strictObject({
    nodeClass: nodeClassSchema.optional(),
    message: messageSchema.optional(),
    profileId: z.string().trim().min(1, 'profileId must not be empty').optional(),
    baseVersion: versionNumberText('baseVersion').optional(),
  })
  .superRefine((fields, ctx) => {
    if ((fields.profileId === undefined) !== (fields.baseVersion === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['baseVersion'], message: 'profileId and baseVersion go together: give both to import a new version, neither for a new profile' });
    }
  });
export type ImportProcessFields = z.infer<typeof importProcessFieldsSchema>;

export const PROCESS_FILE_FORMAT = 'channelwright-process';
export const PROCESS_FILE_SCHEMA_VERSION = 1;

/** Our own JSON file of one process version: what export writes and import reads. */
export const processFileSchema = z
  .strictObject({
    format: z.literal(PROCESS_FILE_FORMAT, { error: `format must be "${PROCESS_FILE_FORMAT}"` }),
    schemaVersion: z.literal(PROCESS_FILE_SCHEMA_VERSION, { error: `schemaVersion must be ${PROCESS_FILE_SCHEMA_VERSION}` }),
    nodeClass: nodeClassSchema.optional(),
    exportedAt: z.string().optional().describe('ISO 8601; informative'),
    source: z.object({ profileId: z.string(), version: z.number().int() }).optional().describe('Where it was exported from; informative'),
    process: processSchema,
  })
  .describe('A Channelwright process file (schemaVersion 1)');
export type ProcessFile = z.infer<typeof processFileSchema>;

/** The header of the CSV import, in this order. */
export const PROCESS_CSV_COLUMNS = ['parameter', 'polarity', 'value', 'unit'] as const;
