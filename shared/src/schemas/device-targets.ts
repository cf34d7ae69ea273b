import { z } from 'zod';
import { polaritySchema } from './process.js';
import { editedVersionSchema } from './projects.js';
import { CONSTRAINTS } from './request-fields.js';
import { deviceLimitsSchema } from './sheet-corners.js';
import { sizeRequestSchema } from './size.js';
import { label, text } from './text-fields.js';

/**
 * A device's sizing targets on a sheet (POST /api/sheets/:id/devices, PATCH /api/devices/:id): what the
 * designer asks of it. SI units, temperatures in °C, voltages polarity-normalised as in the compute API.
 * Targets the schema refuses answer 400 naming the field; a corner or flavour the sheet's process does not
 * have answers 400 too (UNKNOWN_CORNER, UNKNOWN_FLAVOUR, FLAVOUR_POLARITY_MISMATCH).
 */

const size = sizeRequestSchema.shape;

const deviceName = label('name', 50).describe('M1, M2 … or the designer\'s own; unique in the sheet');
const deviceFunction = text('function', 200).describe('Free text: input pair, tail source, mirror load, switch …');
const matchGroup = label('matchGroup', 50).describe('Devices with the same match group must match (offset estimate in the totals)');
const multiplier = z
  .number({ error: 'multiplier must be a whole number' })
  .int('multiplier must be a whole number')
  .min(1, 'multiplier must be at least 1')
  .max(100_000, 'multiplier must be at most 100000')
  .describe('Identical devices in parallel (m): current, area and leakage count m times');
const supplyBranch = z.boolean({ error: 'supplyBranch must be true or false' }).describe('Its ID is drawn from the supply: counted in the sheet\'s supply current and power');
const notes = text('notes', 5000);
const nodeName = (terminal: string) =>
  z
    .string({ error: `${terminal} node must be text` })
    .trim()
    .min(1, `${terminal} node must not be empty`)
    .max(50, `${terminal} node must have at most 50 characters`)
    .regex(/^[A-Za-z0-9_]+$/, `${terminal} node may hold letters, digits and _ only (a netlist reads anything else as syntax)`)
    .optional();
const nodes = z
  .strictObject({ drain: nodeName('Drain'), gate: nodeName('Gate'), source: nodeName('Source'), bulk: nodeName('Bulk') })
  .describe('Node names for the SPICE export; a terminal without one gets a placeholder (d_<name>, g_<name> …)');

/** The target fields of a device; each optional here, the full and the patch schemas below pick what is required. */
const targetFields = {
  name: deviceName,
  function: deviceFunction,
  polarity: polaritySchema,
  flavour: size.flavour.unwrap(),
  id: size.id,
  l: size.l,
  vds: size.vds,
  vsb: size.vsb.unwrap(),
  temperature: size.temperature.unwrap().describe('°C; the sheet\'s temperature when absent'),
  corner: size.corner.unwrap().describe('A corner of the sheet\'s process; the sheet\'s corner when absent'),
  model: size.model.unwrap().describe('The sheet\'s model when absent'),
  vov: size.vov.unwrap(),
  gmId: size.gmId.unwrap(),
  w: size.w.unwrap(),
  vgs: size.vgs.unwrap(),
  maxFingerWidth: size.maxFingerWidth.unwrap(),
  matchGroup,
  multiplier,
  supplyBranch,
  notes,
  limits: deviceLimitsSchema,
  nodes,
};

export const DEVICE_CONSTRAINTS = CONSTRAINTS;
export type DeviceConstraint = (typeof DEVICE_CONSTRAINTS)[number];

function checkOneConstraint(value: Partial<Record<DeviceConstraint, number | null>>, ctx: z.core.$RefinementCtx, atMost: boolean): void {
  const given = DEVICE_CONSTRAINTS.filter((name) => value[name] !== undefined && value[name] !== null);
  if (given.length === 0 && !atMost) {
    ctx.addIssue({ code: 'custom', path: ['vov'], message: 'Give exactly one of vov, gmId, w, vgs (none was given)' });
  } else if (given.length > 1) {
    ctx.addIssue({ code: 'custom', path: [given[1]], message: `Give exactly one of vov, gmId, w, vgs (${given.join(' and ')} were given)` });
  }
}

/** A device's sizing targets: POST /api/sheets/:id/devices, and `targets` of every device response. */
export const deviceTargetsSchema = z
  .strictObject({
    name: targetFields.name,
    function: targetFields.function.default(''),
    polarity: targetFields.polarity,
    flavour: targetFields.flavour.optional(),
    id: targetFields.id,
    l: targetFields.l,
    vds: targetFields.vds,
    vsb: targetFields.vsb.default(0),
    temperature: targetFields.temperature.optional(),
    corner: targetFields.corner.optional(),
    model: targetFields.model.optional(),
    vov: targetFields.vov.optional(),
    gmId: targetFields.gmId.optional(),
    w: targetFields.w.optional(),
    vgs: targetFields.vgs.optional(),
    maxFingerWidth: targetFields.maxFingerWidth.optional(),
    matchGroup: targetFields.matchGroup.optional(),
    multiplier: targetFields.multiplier.default(1),
    supplyBranch: targetFields.supplyBranch.default(false),
    notes: targetFields.notes.default(''),
    limits: targetFields.limits.optional(),
    nodes: targetFields.nodes.optional(),
  })
  .superRefine((value, ctx) => checkOneConstraint(value, ctx, false))
  .describe('Sizing targets: ID, L, VDS, VSB and exactly one of vov, gmId, w, vgs; corner, temperature and model default to the sheet\'s');
export type DeviceTargets = z.infer<typeof deviceTargetsSchema>;
export type DeviceTargetsInput = z.input<typeof deviceTargetsSchema>;
export const createDeviceRequestSchema = deviceTargetsSchema;
export type CreateDeviceRequest = DeviceTargets;
export type CreateDeviceRequestInput = DeviceTargetsInput;

/**
 * PATCH /api/sheets/:id/devices/:deviceId: `version` and the fields that change. A constraint given
 * (vov, gmId, w or vgs) replaces the stored one and keeps every other target; null clears an optional
 * target (back to the sheet's default). The merged targets must pass deviceTargetsSchema.
 */
export const updateDeviceRequestSchema = z
  .strictObject({
    version: editedVersionSchema,
    name: targetFields.name.optional(),
    function: targetFields.function.optional(),
    polarity: targetFields.polarity.optional(),
    flavour: targetFields.flavour.nullable().optional(),
    id: targetFields.id.optional(),
    l: targetFields.l.optional(),
    vds: targetFields.vds.optional(),
    vsb: targetFields.vsb.optional(),
    temperature: targetFields.temperature.nullable().optional(),
    corner: targetFields.corner.nullable().optional(),
    model: targetFields.model.nullable().optional(),
    vov: targetFields.vov.optional(),
    gmId: targetFields.gmId.optional(),
    w: targetFields.w.optional(),
    vgs: targetFields.vgs.optional(),
    maxFingerWidth: targetFields.maxFingerWidth.nullable().optional(),
    matchGroup: targetFields.matchGroup.nullable().optional(),
    multiplier: targetFields.multiplier.optional(),
    supplyBranch: targetFields.supplyBranch.optional(),
    notes: targetFields.notes.optional(),
    limits: targetFields.limits.nullable().optional(),
    nodes: targetFields.nodes.nullable().optional(),
  })
  .superRefine((value, ctx) => checkOneConstraint(value, ctx, true));
export type UpdateDeviceRequest = z.infer<typeof updateDeviceRequestSchema>;
export type UpdateDeviceRequestInput = z.input<typeof updateDeviceRequestSchema>;
