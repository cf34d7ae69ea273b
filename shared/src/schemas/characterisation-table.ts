import { z } from 'zod';
import { polaritySchema } from './process.js';

/**
 * Lookup tables characterised from a process version's model card: their grid, how a result names the table it
 * came from, and the table list of a version (GET /api/processes/:id/tables). SI units, temperatures in °C,
 * voltages polarity-normalised (PMOS: VSG, VSD, VBS).
 */

/** The grid of one table (TableGrid of the engine): every list ascending. */
export const tableGridSchema = z.object({
  polarity: polaritySchema,
  modelName: z.string().describe('The card model it was characterised from'),
  referenceWidth: z.number().describe('Every point was simulated at this W, m; currents, conductances and capacitances scale with the effective width'),
  widthOffset: z.number().optional().describe('The card\'s width reduction 2·wint, m: a device of width W carries (W − widthOffset)/(referenceWidth − widthOffset) times the table\'s current'),
  lengthOffset: z.number().optional().describe('The card\'s length reduction 2·lint, m: the effective length a result shows is L − lengthOffset'),
  lengths: z.array(z.number()).describe('m'),
  vgs: z.object({ start: z.number(), step: z.number(), count: z.number().int() }).describe('VGS axis: start, start + step, … (count values), V'),
  vds: z.array(z.number()).describe('V'),
  vsb: z.array(z.number()).describe('V'),
  corners: z.array(z.string()).describe('Corner names of the profile'),
  temperatures: z.array(z.number()).describe('°C'),
});
export type TableGridResponse = z.infer<typeof tableGridSchema>;

/** The table a result was computed from: a result records its hash, and is stale once the version's current table for the device is another. */
export const tableRefSchema = z.object({
  id: z.string(),
  sha256: z.string().describe('SHA-256 (hex) of the table\'s content'),
  characterisationId: z.string(),
  model: z.string().describe('The card model'),
});
export type TableRef = z.infer<typeof tableRefSchema>;

/** One stored table of a process version. */
export const characterisationTableSchema = tableRefSchema.extend({
  processId: z.string(),
  version: z.number().int(),
  polarity: polaritySchema,
  flavour: z.string().nullable(),
  points: z.number().int(),
  size: z.number().int().describe('Bytes of the table before compression'),
  storedBytes: z.number().int().describe('Bytes stored (byte-shuffled and gzip-compressed)'),
  grid: tableGridSchema,
  current: z.boolean().describe('The table the table model uses for this polarity and flavour: the newest finished characterisation covering it'),
  createdAt: z.string(),
});
export type CharacterisationTable = z.infer<typeof characterisationTableSchema>;

export const characterisationTableListSchema = z.array(characterisationTableSchema).describe('Current tables first, then by polarity and flavour, newest first');
