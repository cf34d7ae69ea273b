import { z } from 'zod';
import { tableRefSchema } from './characterisation-table.js';
import { polaritySchema } from './process.js';
import { modelSchema } from './request-fields.js';

/** The operating point of a sized device as every compute answer gives it, and the context of a result. */

export const regionSchema = z.enum(['weak', 'moderate', 'strong']).describe('weak IC < 0.1 ≤ moderate ≤ 10 < strong (Binkley 2008)');

export const leakageSchema = z.object({
  conductsAtZeroVgs: z.boolean().describe('Depletion-mode device: conducts at VGS = 0, which is not leakage'),
  idAtZeroVgs: z.number(),
  subthreshold: z.number().nullable(),
  gate: z.number().describe('Off-state gate leakage through the drain overlap, A'),
  junction: z.number().describe('Drain-junction leakage at this temperature, A'),
  gidl: z.number().optional().describe('Gate-induced drain leakage, A (absent in results of engine 1.x)'),
  ioff: z.number().nullable(),
  ion: z.number(),
  ionIoff: z.number().nullable(),
  estimates: z.array(z.enum(['gate', 'junction', 'gidl'])).optional().describe('Terms computed from first-order laws, not from the current model'),
});

/** Fields added by engine 2.0; results frozen before it lack them, so they stay optional on reading. */
const sinceEngine2 = (schema: z.ZodNumber, what: string) => schema.optional().describe(`${what} (absent in results of engine 1.x)`);

export const operatingPointSchema = z.object({
  w: z.number().describe('Drawn width (all fingers), m'),
  l: z.number(),
  weff: sinceEngine2(z.number(), 'Effective width W − fingers·ΔW, m'),
  leff: sinceEngine2(z.number(), 'Effective length L − ΔL, m'),
  wOverL: z.number(),
  vgs: z.number().describe('VGS (PMOS: VSG) reached, V'),
  vds: z.number().describe('VDS (PMOS: VSD), V'),
  vsb: z.number().describe('VSB (PMOS: VBS), V'),
  vt: z.number().describe('Threshold with body effect, corner, temperature and DIBL, polarity-normalised (PMOS: −VTP), V'),
  eta: sinceEngine2(z.number(), 'DIBL coefficient at this length, V/V'),
  vov: z.number().describe('VGS − VT reached, V'),
  n: z.number(),
  ut: z.number().describe('kT/q, V'),
  beta: z.number().describe('kp(T)·Weff/Leff, A/V²'),
  lambda: z.number().describe('λ at this L, 1/V'),
  id: z.number(), gm: z.number(), gmb: z.number(), gds: z.number(),
  ro: z.number().nullable().describe('1/gds, Ω; null when gds = 0 (infinite)'),
  gmId: z.number(),
  intrinsicGain: z.number().nullable().describe('gm/gds; null when gds = 0'),
  ic: z.number().describe('Inversion coefficient ID/(2·n·β·UT²)'),
  region: regionSchema,
  vdsat: z.number(),
  saturated: z.boolean(),
  cgs: z.number(), cgd: z.number(),
  cgb: sinceEngine2(z.number(), 'Intrinsic gate–body capacitance, F'),
  cgg: sinceEngine2(z.number(), 'Cgs + Cgd + Cgb, F'),
  cdb: z.number(), csb: z.number(),
  ft: z.number().describe('gm/(2π·Cgg), Hz'),
  sigmaVt: z.number().describe('Pelgrom σ(ΔVT) of a matched pair of this device, V (single device: sigmaVtSingle)'),
  sigmaVtSingle: z.number(),
  sigmaBeta: z.number().describe('σ(Δβ/β) of the pair'),
  sigmaId: z.number().describe('σ(ΔID/ID) of the pair at equal VGS'),
  sigmaVos: z.number().describe('Gate-referred σ(VOS) of the pair at equal ID, V'),
  ioff: z.number().nullable().describe('Off current at VGS = 0, VDS = vdd, VSB = 0 plus gate, junction and GIDL leakage, A; null for a depletion-mode device'),
  ion: z.number(),
  ionIoff: z.number().nullable(),
  leakage: leakageSchema,
});
export type OperatingPointResponse = z.infer<typeof operatingPointSchema>;

/** How far the model that made a result is known to be off (device/model-accuracy.ts; measured in docs/extraction.md). */
export const modelAccuracySchema = z.object({
  basis: z.enum(['long-channel', 'fitted', 'table']).describe('long-channel: first-order equations; fitted: short-channel terms fitted to a card; table: characterised from the card'),
  summary: z.string(),
});
export type ModelAccuracy = z.infer<typeof modelAccuracySchema>;

/** What every compute answer says about how it was made. */
export const resultContext = {
  accuracy: modelAccuracySchema.optional().describe('How far this model is known to be off (absent in results of engine 1.x)'),
  engineVersion: z.string(),
  polarity: polaritySchema,
  flavour: z.string().optional(),
  model: modelSchema,
  table: tableRefSchema.optional().describe('Model table: the table the result was interpolated in (its SHA-256 makes the result stale when the version gets another table)'),
  analyticFigures: z
    .array(z.string())
    .optional()
    .describe('Model table: the figures the tables do not hold, computed with the all-region long-channel model and the process parameters (mismatch, junction capacitances, gate and junction leakage, …)'),
};
