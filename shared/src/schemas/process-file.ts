import { z } from 'zod';
import { modelCardInputSchema, modelCardMappingTextSchema } from './model-card.js';
import { processSchema } from './process.js';
import { messageSchema, nodeClassSchema, versionNumberText } from './process-profile.js';

/**
 * Process files in and out of the library: our own JSON file of one version (what export writes and
 * import reads), the CSV import's columns, and the text fields that come with an upload.
 */

/** Largest process file (JSON or CSV) POST /api/processes/import accepts; a bigger one answers 413 PAYLOAD_TOO_LARGE. A model card may be up to MODEL_CARD_MAX_BYTES. */
export const PROCESS_IMPORT_MAX_BYTES = 1024 * 1024;

/**
 * The text fields of POST /api/processes/import (multipart, beside the `file` and/or the `card`). With profileId
 * and baseVersion the upload becomes a new version of that profile; without, a new profile. The `file` is our JSON
 * process file or the CSV layout, or a SPICE model card (.lib, .l, .mod, .sp, .txt …, or text that starts like
 * one); a card alone becomes a new version of the base version's process with that card. `card` attaches a model
 * card to the process `file` uploaded with it.
 */
export const importProcessFieldsSchema = z
  .strictObject({
    nodeClass: nodeClassSchema.optional(),
    message: messageSchema.optional(),
    profileId: z.string().trim().min(1, 'profileId must not be empty').optional(),
    baseVersion: versionNumberText('baseVersion').optional(),
    mapping: modelCardMappingTextSchema.optional().describe('With a model card: JSON text of its mapping (corners → sections, models → polarity and flavour); guessed from the names when absent'),
  })
  .superRefine((fields, ctx) => {
    if ((fields.profileId === undefined) !== (fields.baseVersion === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['baseVersion'], message: 'profileId and baseVersion go together: give both to import a new version, neither for a new profile' });
    }
  });
export type ImportProcessFields = z.infer<typeof importProcessFieldsSchema>;

/** The text fields of POST /api/processes/model-cards/check (multipart, beside the card `file`): the version whose corners and flavours the mapping is for. */
export const modelCardCheckFieldsSchema = z.strictObject({
  profileId: z.string().trim().min(1, 'profileId must not be empty'),
  version: versionNumberText('version').optional().describe('The latest version when absent'),
  mapping: modelCardMappingTextSchema.optional().describe('JSON text of a mapping to check; guessed from the names when absent'),
});
export type ModelCardCheckFields = z.infer<typeof modelCardCheckFieldsSchema>;

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
    modelCard: modelCardInputSchema.optional().describe('The version\'s model card (re-emitted text) and its mapping'),
  })
  .describe('A Channelwright process file (schemaVersion 1)');
export type ProcessFile = z.infer<typeof processFileSchema>;

/** The header of the CSV import, in this order. */
export const PROCESS_CSV_COLUMNS = ['parameter', 'polarity', 'value', 'unit'] as const;
