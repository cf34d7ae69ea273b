import { z } from 'zod';
import { polaritySchema } from './process.js';

/**
 * Model cards on process versions: a version may carry the designer's SPICE model card, parsed (never
 * trusted) and stored as the text Channelwright re-emits from the parsed statements, with its SHA-256 and
 * the maintainer's mapping of the card's sections to the profile's corners and of its models to polarity
 * and flavour. A card change, or a mapping change, is a new version. Docs: docs/characterisation.md.
 */

/** Largest model card an upload accepts (multipart); a bigger one answers 413 PAYLOAD_TOO_LARGE. */
export const MODEL_CARD_MAX_BYTES = 2 * 1024 * 1024;

const sectionName = z
  .string({ error: 'A card section must be named by text, or null for the statements outside any section' })
  .trim()
  .toLowerCase()
  .min(1, 'A card section name must not be empty')
  .max(100);

const modelName = z.string({ error: 'model must be the name of a .model of the card' }).trim().toLowerCase().min(1, 'model must not be empty').max(100);

/** One device the card provides: which model is the process's NMOS or PMOS, or one of its flavours. */
export const cardDeviceSchema = z.strictObject({
  model: modelName.describe('The .model name in the card (lower case)'),
  polarity: polaritySchema,
  flavour: z.string({ error: 'flavour must be text' }).trim().min(1, 'flavour must not be empty').max(50).optional().describe('A flavour of the process (e.g. "native"); absent for the plain NMOS or PMOS'),
});
export type CardDevice = z.infer<typeof cardDeviceSchema>;

/**
 * Which card section holds each corner's models (corner name → section name, or null for the statements outside
 * any section), and which model is which device. Corners left out have no table; models left out are not characterised.
 */
export const modelCardMappingSchema = z.strictObject({
  corners: z.record(z.string().trim().min(1).max(50), sectionName.nullable()).describe('Corner of the profile → card section (null: the statements outside any section)'),
  devices: z.array(cardDeviceSchema).max(40, 'At most 40 devices').describe('Card model → polarity and flavour; each polarity/flavour at most once'),
});
export type ModelCardMapping = z.infer<typeof modelCardMappingSchema>;

/** A card given with a JSON request (create, update, our process file): the text as uploaded and, optionally, its mapping (guessed from the names when absent). */
export const modelCardInputSchema = z.strictObject({
  text: z
    .string({ error: 'modelCard.text must be the text of a SPICE model card' })
    .min(1, 'modelCard.text must not be empty')
    .max(MODEL_CARD_MAX_BYTES, `modelCard.text must be at most ${MODEL_CARD_MAX_BYTES / 1024 / 1024} MB`),
  mapping: modelCardMappingSchema.optional().describe('Guessed from section and model names when absent (tt → TT, a model named after a flavour → that flavour)'),
});
export type ModelCardInput = z.infer<typeof modelCardInputSchema>;

/** One model of a stored card, as the maintainer maps it. */
export const cardModelSummarySchema = z.object({
  name: z.string(),
  polarity: polaritySchema,
  level: z.number().int(),
  version: z.string().optional(),
  parameterCount: z.number().int(),
});

export const cardSectionSummarySchema = z.object({
  name: z.string().nullable().describe('null: the statements outside any section'),
  models: z.array(cardModelSummarySchema),
});

/** What a process version says about its card (GET /api/processes/:id and every profile answer). */
export const modelCardSummarySchema = z.object({
  sha256: z.string().describe('SHA-256 (hex) of the re-emitted text'),
  bytes: z.number().int().describe('Length of the re-emitted text, bytes'),
  sections: z.array(cardSectionSummarySchema),
  mapping: modelCardMappingSchema,
});
export type ModelCardSummary = z.infer<typeof modelCardSummarySchema>;

/** GET /api/processes/:id/model-card: the summary and the re-emitted text (what a simulator is given). */
export const storedModelCardSchema = modelCardSummarySchema.extend({
  text: z.string().describe('The card as Channelwright re-emitted it from the parsed statements'),
});
export type StoredModelCard = z.infer<typeof storedModelCardSchema>;

/** One problem of a card or its mapping, by line (of the uploaded text) where it has one. */
export const modelCardProblemSchema = z.object({
  line: z.number().int().optional(),
  field: z.string().describe('card, or the mapping entry: mapping.corners.TT, mapping.devices.2.flavour …'),
  message: z.string(),
});
export type ModelCardProblem = z.infer<typeof modelCardProblemSchema>;

/**
 * POST /api/processes/model-cards/check (multipart `file`, with `profileId` and `version`): the card parsed and a
 * mapping guessed for that version, nothing stored; the client shows it for the maintainer to correct before upload.
 */
export const modelCardCheckSchema = z.object({
  ok: z.boolean(),
  problems: z.array(modelCardProblemSchema),
  card: modelCardSummarySchema.nullable().describe('null when the card itself is refused'),
});
export type ModelCardCheck = z.infer<typeof modelCardCheckSchema>;

/** The text fields of a multipart card upload (POST /api/processes/import with a card file, and the check). */
export const modelCardMappingTextSchema = z
  .string({ error: 'mapping must be the JSON text of a mapping' })
  .max(100_000)
  .transform((text, ctx) => {
    try {
      return JSON.parse(text) as unknown;
    } catch {
      ctx.addIssue({ code: 'custom', message: 'mapping must be JSON: { "corners": { "TT": "tt" }, "devices": [{ "model": "n1", "polarity": "nmos" }] }' });
      return z.NEVER;
    }
  })
  .pipe(modelCardMappingSchema);
