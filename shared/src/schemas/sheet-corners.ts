import { z } from 'zod';
import { polaritySchema } from './process.js';
import { corner, modelSchema, quantity, uniqueList } from './request-fields.js';
import { WARNING_CODES } from './warning.js';

/**
 * POST /api/sheets/:id/corners: every sized device of a sheet, its W and L fixed, at every corner of the
 * sheet's process × the temperatures of the process range (its minimum, nominal and maximum, plus any the
 * designer adds) × optionally the supply at VDD ± a tolerance, in one answer. Each cell is what
 * POST /api/compute/corners gives for that device at that corner and temperature. Numbers in SI units,
 * temperatures in °C, voltages polarity-normalised (PMOS: VSG, VSD).
 */

/** The figures of a matrix cell: what a current-biased check reports, and what a voltage-biased one adds. */
export const MATRIX_FIGURES = ['vgs', 'vov', 'vdsat', 'headroom', 'gm', 'gmId', 'ft', 'intrinsicGain', 'id', 'idChange'] as const;
export type MatrixFigure = (typeof MATRIX_FIGURES)[number];

/** How each figure reads: its symbol (NMOS, PMOS), SI unit ('' plain, '%' for a relative change) and which way it gets worse. */
export const MATRIX_FIGURE_INFO: Record<MatrixFigure, { label: string; pmosLabel: string; unit: string; worse: 'min' | 'max' | 'away-from-zero' }> = {
  vgs: { label: 'VGS', pmosLabel: 'VSG', unit: 'V', worse: 'max' },
  vov: { label: 'VOV', pmosLabel: 'VOV', unit: 'V', worse: 'max' },
  vdsat: { label: 'VDSsat', pmosLabel: 'VSDsat', unit: 'V', worse: 'max' },
  headroom: { label: 'VDS − VDSsat', pmosLabel: 'VSD − VSDsat', unit: 'V', worse: 'min' },
  gm: { label: 'gm', pmosLabel: 'gm', unit: 'S', worse: 'min' },
  gmId: { label: 'gm/ID', pmosLabel: 'gm/ID', unit: '1/V', worse: 'min' },
  ft: { label: 'fT', pmosLabel: 'fT', unit: 'Hz', worse: 'min' },
  intrinsicGain: { label: 'gm/gds', pmosLabel: 'gm/gds', unit: 'V/V', worse: 'min' },
  id: { label: 'ID', pmosLabel: 'ID', unit: 'A', worse: 'min' },
  idChange: { label: 'ID change', pmosLabel: 'ID change', unit: '%', worse: 'away-from-zero' },
};

/** Figures that mean something for each biasing: current-biased holds ID, voltage-biased holds VGS. */
export const MATRIX_FIGURES_OF_BIAS = {
  current: ['vgs', 'vov', 'vdsat', 'headroom', 'gm', 'gmId', 'ft', 'intrinsicGain'],
  voltage: ['id', 'idChange', 'vov', 'vdsat', 'headroom', 'gm', 'gmId', 'ft', 'intrinsicGain'],
} as const satisfies Record<'current' | 'voltage', readonly MatrixFigure[]>;

/**
 * A designer's limit on one figure of a device: at least `min`, at most `max` (SI; idChange as a fraction,
 * 0.2 for +20 %). "VDSsat at most VDS − 50 mV" is { figure: 'headroom', min: 0.05 }; "ID within ±20 %" is
 * { figure: 'idChange', min: -0.2, max: 0.2 }.
 */
export const deviceLimitSchema = z
  .strictObject({
    figure: z.enum(MATRIX_FIGURES, { error: `figure must be one of ${MATRIX_FIGURES.join(', ')}` }),
    min: z.number({ error: 'min must be a number' }).finite('min must be a finite number').optional(),
    max: z.number({ error: 'max must be a number' }).finite('max must be a finite number').optional(),
  })
  .superRefine((limit, ctx) => {
    if (limit.min === undefined && limit.max === undefined) ctx.addIssue({ code: 'custom', path: ['min'], message: 'A limit needs a minimum, a maximum or both' });
    if (limit.min !== undefined && limit.max !== undefined && limit.min > limit.max) ctx.addIssue({ code: 'custom', path: ['max'], message: 'The maximum must not be below the minimum' });
  });
export type DeviceLimit = z.infer<typeof deviceLimitSchema>;

export const deviceLimitsSchema = z
  .array(deviceLimitSchema, { error: 'limits must be a list' })
  .max(MATRIX_FIGURES.length, `limits may list at most ${MATRIX_FIGURES.length}`)
  .refine((list) => new Set(list.map((l) => l.figure)).size === list.length, 'limits lists a figure twice')
  .describe('The designer\'s limits on the corner-matrix figures of this device');

export const sheetCornersRequestSchema = z
  .strictObject({
    bias: z.enum(['current', 'voltage'], { error: 'bias must be "current" (hold ID, as in a mirror) or "voltage" (hold VGS)' }).default('current'),
    deviceIds: z.array(z.string().min(1), { error: 'deviceIds must be a list of device ids' }).min(1, 'deviceIds must not be empty').max(2000).optional().describe('Only these devices; every sized device when absent'),
    corners: uniqueList(corner, 'corners', 20).optional().describe('TT and every corner of the process when absent'),
    temperatures: z
      .array(quantity('temperatures', '°C', { min: -200, max: 300 }), { error: 'temperatures must be a list' })
      .max(8, 'temperatures may add at most 8')
      .optional()
      .describe('Temperatures added to the range minimum, nominal and maximum, °C'),
    vddTolerance: quantity('vddTolerance', '', { min: 0, max: 0.5 }).optional().describe('Also at VDD·(1 ± tolerance), e.g. 0.1 for ±10 %; the supply sets the gate-drive ceiling, the off-state VDS and the warnings, each device keeps its VDS'),
  })
  .describe('POST /api/sheets/:id/corners: the corner × temperature (× supply) matrix of the sheet\'s sized devices');
export type SheetCornersRequest = z.infer<typeof sheetCornersRequestSchema>;
export type SheetCornersRequestInput = z.input<typeof sheetCornersRequestSchema>;

export const LIMIT_STATUSES = ['fail', 'tight', 'ok', 'none'] as const;
export type LimitStatus = (typeof LIMIT_STATUSES)[number];

export const matrixColumnSchema = z.object({
  corner: z.string(),
  temperature: z.number().describe('°C'),
  vdd: z.number().describe('The supply of this column, V'),
});
export type MatrixColumn = z.infer<typeof matrixColumnSchema>;

const figureValues = z.record(z.enum(MATRIX_FIGURES), z.number().nullable());

export const matrixCellSchema = z.object({
  values: figureValues.describe('Every figure at this corner, temperature and supply; null where it has no value (ro infinite, or no answer)'),
  status: z.record(z.enum(MATRIX_FIGURES), z.enum(LIMIT_STATUSES)).describe('Against the device\'s limits: fail (outside), tight (inside by less than 10 % of the limit), ok, none (no limit on it)'),
  warnings: z.array(z.enum(WARNING_CODES)),
  error: z.object({ code: z.string(), message: z.string() }).optional().describe('Why this cell has no answer (counts as failing)'),
});
export type MatrixCell = z.infer<typeof matrixCellSchema>;

export const worstCellSchema = z.object({
  column: z.number().int().describe('Index into columns'),
  value: z.number().nullable(),
  status: z.enum(LIMIT_STATUSES),
});
export type WorstCell = z.infer<typeof worstCellSchema>;

export const matrixRowSchema = z.object({
  deviceId: z.string(),
  name: z.string(),
  polarity: polaritySchema,
  flavour: z.string().optional(),
  model: modelSchema,
  w: z.number(),
  l: z.number(),
  vds: z.number().describe('Held at every cell, V'),
  reference: z.object({ id: z.number(), vgs: z.number() }).describe('The stored result: ID held when current-biased, VGS held when voltage-biased, and the ID the change is counted from'),
  limits: deviceLimitsSchema,
  cells: z.array(matrixCellSchema).describe('One per column, in the order of columns'),
  worst: z.record(z.enum(MATRIX_FIGURES), worstCellSchema.nullable()).describe('The worst cell of the row for each figure: the least margin to a limit, else the worse direction of the figure; a cell without an answer first'),
});
export type MatrixRow = z.infer<typeof matrixRowSchema>;

export const sheetCornersResponseSchema = z.object({
  bias: z.enum(['current', 'voltage']),
  engineVersion: z.string(),
  columns: z.array(matrixColumnSchema).describe('Corner-major, then temperature, then supply'),
  rows: z.array(matrixRowSchema),
  skipped: z.array(z.object({ deviceId: z.string(), name: z.string(), reason: z.string() })).describe('Devices without a stored result (nothing sized to check)'),
});
export type SheetCornersResponse = z.infer<typeof sheetCornersResponseSchema>;
