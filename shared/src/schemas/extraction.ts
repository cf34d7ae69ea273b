import { z } from 'zod';
import { polaritySchema, deviceParamsSchema } from './process.js';
import { messageSchema, userRefSchema, versionNumberText } from './process-profile.js';
import { ANALYTIC_MODELS } from './request-fields.js';

/**
 * Parameter extraction (docs/extraction.md): a profile's parameters fitted to measured or simulated drain-current
 * curves, run as a job. Numbers in SI units, temperatures in °C, voltages and currents polarity-normalised (PMOS:
 * VSG, VSD, VBS and the source-to-drain current, all positive for a conducting device).
 */

/** The models a fit can be made of: the two analytic ones (a table is measured, not fitted). */
export const extractionModelSchema = z
  .enum(ANALYTIC_MODELS, { error: 'model must be "all-region" or "square-law"' })
  .describe('square-law: SPICE level 1\'s parameters; all-region: the charge-based model with its short-channel terms');
export type ExtractionModel = z.infer<typeof extractionModelSchema>;

/** The parameters an extraction can fit (the engine's FIT_PARAMETERS are this list). */
export const EXTRACTION_PARAMETERS = ['vt0', 'kp', 'n', 'gamma', 'twoPhiF', 'lambda', 'dl', 'dw', 'theta0', 'theta1', 'theta2', 'thetaB', 'dibl', 'diblExp', 'vtl', 'vtlExp', 'nl', 'pclm', 'vtTc', 'muExp', 'muExpL'] as const;
export type ExtractionParameter = (typeof EXTRACTION_PARAMETERS)[number];

/** Largest curve file POST /api/extractions accepts; a bigger one answers 413 PAYLOAD_TOO_LARGE. */
export const CURVE_FILE_MAX_BYTES = 5 * 1024 * 1024;
/** Most data rows of a curve file (each a point of the fit). */
export const CURVE_FILE_MAX_POINTS = 50_000;
/** Most Levenberg–Marquardt iterations a request may ask for (per stage of the fit). */
export const EXTRACTION_MAX_ITERATIONS = 2000;

export const EXTRACTION_STATUSES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export type ExtractionStatus = (typeof EXTRACTION_STATUSES)[number];

const parameterList = z
  .array(z.enum(EXTRACTION_PARAMETERS, { error: `fixed lists parameters of ${EXTRACTION_PARAMETERS.join(', ')}` }), { error: 'fixed must be a list of parameter names' })
  .max(EXTRACTION_PARAMETERS.length)
  .refine((list) => new Set(list).size === list.length, 'fixed lists a parameter twice');

/** The fields of a fit's options, each without its default (a re-run takes absent ones from the run it repeats). */
const optionFields = {
  model: extractionModelSchema,
  fixed: parameterList.describe('Parameters held at the base profile\'s value even where the data could tell them'),
  noiseFloor: z.number({ error: 'noiseFloor must be a number in A' }).min(0, 'noiseFloor must be at least 0 A').max(1e-3, 'noiseFloor must be at most 1 mA').nullable().describe('Currents below this are left out, A; 1 pA when null'),
  maxIterations: z
    .number({ error: 'maxIterations must be a whole number' })
    .int('maxIterations must be a whole number')
    .min(10, 'maxIterations must be at least 10')
    .max(EXTRACTION_MAX_ITERATIONS, `maxIterations must be at most ${EXTRACTION_MAX_ITERATIONS}`)
    .describe('Most iterations per stage of the fit'),
  minGmId: z.number({ error: 'minGmId must be a number in S/A' }).min(0, 'minGmId must be at least 0 S/A').max(40, 'minGmId must be at most 40 S/A').nullable().describe('All-region fits leave out points of lower gm/ID (far above threshold); 3 S/A when null'),
};

/** The options of a fit: SI numbers. */
export const extractionOptionsSchema = z.strictObject({
  model: optionFields.model.default('all-region'),
  fixed: optionFields.fixed.default([]),
  noiseFloor: optionFields.noiseFloor.default(null),
  maxIterations: optionFields.maxIterations.default(300),
  minGmId: optionFields.minGmId.default(null),
});
export type ExtractionOptions = z.infer<typeof extractionOptionsSchema>;

/** POST /api/extractions/:id/rerun: the same points, other options (absent: as the run it repeats). */
export const rerunExtractionRequestSchema = z.strictObject(optionFields).partial();
export type RerunExtractionRequest = z.infer<typeof rerunExtractionRequestSchema>;

/** A subset of a table axis: values on the grid, each once. */
const axisSubset = (field: string, unit: string) =>
  z
    .array(z.number({ error: `${field} must be numbers in ${unit}` }).finite(`${field} must be finite numbers in ${unit}`), { error: `${field} must be a list of numbers in ${unit}` })
    .min(1, `${field} must list at least one value (leave it out for every value of the table)`)
    .max(100, `${field} may list at most 100 values`)
    .refine((list) => new Set(list).size === list.length, `${field} lists a value twice`)
    .optional();

/**
 * POST /api/extractions/from-table: fit a profile's parameters to the current characterised table of one of its
 * versions' devices (polarity and flavour), read at one corner and optionally fewer temperatures, lengths, VDS and VSB
 * (every value of the grid when absent; a value not on the grid is refused), with the same options as an upload.
 */
export const extractionFromTableRequestSchema = z.strictObject({
  processId: z.string({ error: 'processId must be text' }).trim().min(1, 'processId must not be empty').max(200).describe('The profile whose version was characterised; the fit starts from that version'),
  version: z.number({ error: 'version must be a whole number' }).int('version must be a whole number').positive('version must be at least 1').optional().describe('The latest version when absent'),
  polarity: polaritySchema,
  flavour: z.string({ error: 'flavour must be text' }).trim().min(1, 'flavour must not be empty').max(50).nullable().optional().describe('The flavour\'s table; the plain device when absent'),
  corner: z.string({ error: 'corner must be text' }).trim().min(1, 'corner must not be empty').max(40).describe('A corner of the table, e.g. "TT"'),
  temperatures: axisSubset('temperatures', '°C'),
  lengths: axisSubset('lengths', 'm'),
  vds: axisSubset('vds', 'V'),
  vsb: axisSubset('vsb', 'V'),
  ...extractionOptionsSchema.shape,
});
export type ExtractionFromTableRequest = z.infer<typeof extractionFromTableRequestSchema>;
export type ExtractionFromTableRequestInput = z.input<typeof extractionFromTableRequestSchema>;

/** A text field of a multipart upload holding a quantity ("2u", "2 µm", "2e-6"), read by the curve-file reader. */
const quantityText = (field: string) => z.string({ error: `${field} must be text` }).trim().min(1, `${field} must not be empty`).max(40, `${field} must have at most 40 characters`);
/** A number in a multipart text field. */
const numberText = (field: string, min: number, max: number, unit: string) =>
  z.coerce.number({ error: `${field} must be a number${unit}` }).min(min, `${field} must be at least ${min}${unit}`).max(max, `${field} must be at most ${max}${unit}`);

/**
 * The text fields of POST /api/extractions (multipart, beside the `file`): the base profile, the polarity, the
 * geometry when the file has no W and L columns, and the fit's options. Everything arrives as text.
 */
export const extractionUploadFieldsSchema = z.strictObject({
  processId: z.string({ error: 'processId must be text' }).trim().min(1, 'processId must not be empty').max(200).describe('The base profile: everything not fitted comes from it'),
  version: versionNumberText('version').optional().describe('Its version; the latest when absent'),
  polarity: polaritySchema,
  w: quantityText('W').optional().describe('Drawn width (all fingers) when the file has no W column, e.g. "10u" or "10 µm"'),
  l: quantityText('L').optional().describe('Drawn length when the file has no L column'),
  fingers: numberText('fingers', 1, 10_000, '').int('fingers must be a whole number').optional().describe('Fingers when the file has no fingers column; 1 when absent'),
  temperature: quantityText('temperature').optional().describe('°C, when the file has no temperature column'),
  model: extractionModelSchema.default('all-region'),
  fixed: z
    .string()
    .trim()
    .max(300)
    .optional()
    .transform((text) => (text ? text.split(/[\s,;]+/).filter(Boolean) : []))
    .pipe(parameterList)
    .describe('Comma-separated parameters to hold at the base profile\'s value'),
  noiseFloor: numberText('noiseFloor', 0, 1e-3, ' A').optional().describe('A; 1 pA when absent'),
  maxIterations: numberText('maxIterations', 10, EXTRACTION_MAX_ITERATIONS, '').int('maxIterations must be a whole number').optional(),
  minGmId: numberText('minGmId', 0, 40, ' S/A').optional(),
});
export type ExtractionUploadFields = z.infer<typeof extractionUploadFieldsSchema>;

/** How a PMOS file's signs were read. */
export const SIGN_CONVENTIONS = ['positive', 'negative'] as const;
export type SignConvention = (typeof SIGN_CONVENTIONS)[number];

/** One VGS sweep of the points: what its points share, and where they are in the file. */
export const curveSummarySchema = z.object({
  w: z.number().describe('m'),
  l: z.number().describe('m'),
  fingers: z.number().int(),
  vds: z.number().describe('V, polarity-normalised'),
  vsb: z.number().describe('V, polarity-normalised'),
  temperature: z.number().describe('°C'),
  points: z.number().int(),
  vgsMin: z.number(),
  vgsMax: z.number(),
  /** Rows of the file (the header is its first line that is not a comment). */
  firstRow: z.number().int(),
  lastRow: z.number().int(),
});
export type CurveSummary = z.infer<typeof curveSummarySchema>;

/** The characterised table an upload's points were written from (POST /api/extractions/from-table). */
export const tableOriginSchema = z.object({
  processId: z.string(),
  processName: z.string(),
  version: z.number().int(),
  polarity: polaritySchema,
  flavour: z.string().nullable(),
  tableId: z.string(),
  sha256: z.string().describe('SHA-256 (hex) of the table\'s content'),
  characterisationId: z.string(),
  model: z.string().describe('The card model'),
  corner: z.string(),
});
export type TableOrigin = z.infer<typeof tableOriginSchema>;

/** Where an extraction's points came from. */
export const extractionSourceSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('upload'),
    table: tableOriginSchema.nullable().describe('The characterised table the points were written from; null for a file a user uploaded'),
    uploadId: z.string(),
    fileName: z.string(),
    sha256: z.string().describe('SHA-256 (hex) of the uploaded bytes as kept'),
    bytes: z.number().int(),
    points: z.number().int(),
    convention: z.enum(SIGN_CONVENTIONS).describe('negative: the file gave a PMOS in SPICE signs (VGS, VDS ≤ 0, ID < 0), turned into positive ones'),
    notes: z.array(z.string()).describe('How the file was read: units, defaults, conversions'),
    curves: z.array(curveSummarySchema),
  }),
]);
export type ExtractionSource = z.infer<typeof extractionSourceSchema>;

export const fittedParameterSchema = z.object({
  name: z.enum(EXTRACTION_PARAMETERS),
  value: z.number(),
  unit: z.string(),
  initial: z.number().describe('The estimate before the joint fit'),
  standardError: z.number().nullable().describe('One standard error from the fit\'s covariance; null when the data cannot tell it'),
});
export type FittedParameterResponse = z.infer<typeof fittedParameterSchema>;

export const heldParameterSchema = z.object({
  name: z.enum(EXTRACTION_PARAMETERS),
  value: z.number().nullable().describe('The base profile\'s value; null when the profile has none (the term is off)'),
  reason: z.string(),
});

export const regionErrorSchema = z.object({
  region: z.enum(['weak', 'moderate', 'strong', 'all']),
  points: z.number().int(),
  rms: z.number().describe('Root-mean-square of ID_model/ID_measured − 1'),
});

export const excludedPointSchema = z.object({
  index: z.number().int().describe('The point\'s index in the extraction'),
  row: z.number().int().nullable().describe('Its row in the uploaded file'),
  reason: z.string(),
});
export type ExcludedPointResponse = z.infer<typeof excludedPointSchema>;

export const extractionResultSchema = z.object({
  model: extractionModelSchema,
  parameters: z.array(fittedParameterSchema),
  held: z.array(heldParameterSchema),
  fitted: deviceParamsSchema.describe('The base profile\'s parameters of this polarity with the fitted values in'),
  rms: z.array(regionErrorSchema),
  densityRms: z.number().nullable().describe('All-region fits: RMS of ln(model/measured current density) at the measured gm/ID over the sizing range'),
  excluded: z.array(excludedPointSchema),
  iterations: z.number().int(),
  converged: z.boolean().describe('false: the fit stopped at its iteration limit; the parameters are its last estimate'),
  seconds: z.number().describe('How long the fit ran'),
});
export type ExtractionResultResponse = z.infer<typeof extractionResultSchema>;

export const extractionErrorSchema = z.object({ code: z.string(), message: z.string() });

export const extractionSchema = z.object({
  id: z.string(),
  status: z.enum(EXTRACTION_STATUSES),
  progress: z.object({ iterations: z.number().int(), maxIterations: z.number().int().describe('The most iterations the fit may take (all stages)') }),
  cancelRequested: z.boolean(),
  process: z.object({ id: z.string(), name: z.string(), version: z.number().int(), latestVersion: z.number().int() }).describe('The base profile and its version'),
  polarity: polaritySchema,
  options: extractionOptionsSchema,
  source: extractionSourceSchema,
  result: extractionResultSchema.nullable(),
  error: extractionErrorSchema.nullable().describe('Why a failed or cancelled extraction ended'),
  savedAs: z.object({ profileId: z.string(), version: z.number().int() }).nullable().describe('The profile version saved from this fit'),
  rerunOf: z.string().nullable(),
  attempts: z.number().int().describe('Runs started (a server stop interrupts one; the next start runs it again)'),
  createdBy: userRefSchema.nullable(),
  createdAt: z.string(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
});
export type Extraction = z.infer<typeof extractionSchema>;

export const extractionSummarySchema = extractionSchema.pick({ id: true, status: true, progress: true, process: true, polarity: true, savedAs: true, createdBy: true, createdAt: true, finishedAt: true }).extend({
  model: extractionModelSchema,
  fileName: z.string().nullable(),
  converged: z.boolean().nullable(),
});
export type ExtractionSummary = z.infer<typeof extractionSummarySchema>;
export const extractionListSchema = z.array(extractionSummarySchema).describe('Newest first');

/** One measured point with the fit at it, for the charts of data against fit. */
export const extractionPointSchema = z.object({
  vgs: z.number(),
  id: z.number().describe('Measured, A'),
  modelled: z.number().nullable().describe('The fitted model, A; null where the point was left out or the model refuses it'),
  residual: z.number().nullable().describe('modelled/measured − 1'),
  row: z.number().int().nullable(),
  excluded: z.string().nullable().describe('Why the point was left out of the fit'),
});
export type ExtractionPoint = z.infer<typeof extractionPointSchema>;

/** GET /api/extractions/:id/points: the curves, each a VGS sweep, with the fit at every point. */
export const extractionCurvesSchema = z.object({
  curves: z.array(curveSummarySchema.omit({ firstRow: true, lastRow: true, vgsMin: true, vgsMax: true }).extend({ points: z.array(extractionPointSchema) })),
});
export type ExtractionCurves = z.infer<typeof extractionCurvesSchema>;

/** POST /api/extractions/:id/save: a new version of the base profile with the fitted parameters (maintainers only). */
export const saveExtractionRequestSchema = z.strictObject({
  message: messageSchema.optional().describe('What the version changes; the extraction\'s id is always recorded with it'),
});
export type SaveExtractionRequest = z.infer<typeof saveExtractionRequestSchema>;
