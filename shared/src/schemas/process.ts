import { z } from 'zod';

/**
 * A process: per-polarity MOS parameters at the nominal temperature, corners and optional device
 * flavours. Every voltage is polarity-normalised: for PMOS the engine works with VSG, VSD, VBS and
 * vt = −VTP, so an enhancement device of either polarity has vt0 > 0 and a depletion-mode device
 * vt0 < 0. All values in SI units (m, V, A, F), temperatures in °C.
 */

/** An inclusive range of a parameter, in its SI unit; exclusiveMin makes the lower end strict (a positive quantity). */
export interface ParameterRange {
  readonly min: number;
  readonly max: number;
  readonly exclusiveMin?: boolean;
}

export interface ParameterInfo {
  /** The field name in the process JSON and the CSV import. */
  readonly name: string;
  /** The symbol a designer reads, e.g. "VT0". */
  readonly symbol: string;
  /** SI unit of the stored number; parseQuantity(text, unit) reads a typed value into it. */
  readonly unit: string;
  /** The unit the editor shows, e.g. "µA/V²" for kp; the number stored is still in `unit`. */
  readonly displayUnit: string;
  readonly description: string;
  /** Where a real process's value lies: the editor warns outside it, the schema accepts it. */
  readonly plausible: ParameterRange;
  /**
   * Beyond these the schema refuses the value (no physical or usable answer, or a unit slip such as F/m²
   * given as fF/µm²). Always at least as wide as the plausible range.
   */
  readonly hardLimit: ParameterRange;
  readonly optional: boolean;
}

type ParameterEntry = Omit<ParameterInfo, 'optional' | 'hardLimit'> & { optional?: boolean; hardLimit?: ParameterRange };
/** A parameter whose hard limit is its plausible range unless a wider one is given. */
const p = ({ hardLimit, ...info }: ParameterEntry): ParameterInfo => ({ optional: false, hardLimit: hardLimit ?? info.plausible, ...info });

/** Every per-polarity device parameter, in the order the editor and the CSV list them. */
export const DEVICE_PARAMETERS = [
  p({ hardLimit: { min: -5, max: 5 }, name: 'vt0', symbol: 'VT0', unit: 'V', displayUnit: 'V', plausible: { min: -1, max: 1.5 }, description: 'Threshold voltage at VSB = 0 and tnom, polarity-normalised (−VTP for PMOS): > 0 enhancement, < 0 depletion mode' }),
  p({ hardLimit: { min: 0, max: 0.1, exclusiveMin: true }, name: 'kp', symbol: 'KP', unit: 'A/V²', displayUnit: 'µA/V²', plausible: { min: 10e-6, max: 2e-3 }, description: 'Transconductance parameter µ0·Cox at tnom' }),
  p({ hardLimit: { min: 0, max: 5 }, name: 'gamma', symbol: 'γ', unit: '√V', displayUnit: '√V', plausible: { min: 0, max: 1.5 }, description: 'Body-effect coefficient √(2·q·εSi·NA)/Cox' }),
  p({ hardLimit: { min: 0, max: 2, exclusiveMin: true }, name: 'twoPhiF', symbol: '2φF', unit: 'V', displayUnit: 'V', plausible: { min: 0.3, max: 1.2 }, description: 'Surface potential in strong inversion, 2·UT·ln(NA/ni)' }),
  p({ hardLimit: { min: 0, max: 10 }, name: 'lambda', symbol: 'λ', unit: '1/V', displayUnit: '1/V', plausible: { min: 0, max: 1 }, description: 'Channel-length modulation; with lRef, the value at L = lRef (λ(L) = lambda·lRef/L)' }),
  p({ name: 'lRef', symbol: 'Lref', unit: 'm', displayUnit: 'µm', plausible: { min: 10e-9, max: 100e-6, exclusiveMin: true }, optional: true, description: 'Length at which lambda was measured; when given, λ scales as 1/L' }),
  p({ hardLimit: { min: 1, max: 10 }, name: 'n', symbol: 'n', unit: '', displayUnit: '', plausible: { min: 1, max: 3 }, optional: true, description: 'Subthreshold slope factor; when absent, n = 1 + γ/(2·√(2φF + VSB))' }),
  p({ hardLimit: { min: 0, max: 1e-6, exclusiveMin: true }, name: 'tox', symbol: 'tox', unit: 'm', displayUnit: 'nm', plausible: { min: 0.5e-9, max: 100e-9 }, description: 'Gate-oxide thickness (SiO2-equivalent)' }),
  p({ hardLimit: { min: 0, max: 1e-7 }, name: 'cgdo', symbol: 'CGDO', unit: 'F/m', displayUnit: 'fF/µm', plausible: { min: 0, max: 2e-9 }, description: 'Gate–drain (and gate–source) overlap capacitance per width' }),
  p({ hardLimit: { min: 0, max: 1 }, name: 'cj', symbol: 'CJ', unit: 'F/m²', displayUnit: 'fF/µm²', plausible: { min: 0, max: 1e-2 }, description: 'Zero-bias junction capacitance per area of the source/drain diffusion' }),
  p({ hardLimit: { min: 0, max: 1e-7 }, name: 'cjsw', symbol: 'CJSW', unit: 'F/m', displayUnit: 'fF/µm', plausible: { min: 0, max: 1e-9 }, description: 'Zero-bias junction sidewall capacitance per perimeter' }),
  p({ hardLimit: { min: 0, max: 1e-3 }, name: 'ldiff', symbol: 'Ldiff', unit: 'm', displayUnit: 'µm', plausible: { min: 0, max: 10e-6 }, description: 'Length of the source/drain diffusion (area = W·ldiff)' }),
  p({ hardLimit: { min: -0.05, max: 0.05 }, name: 'vtTc', symbol: 'dVT/dT', unit: 'V/K', displayUnit: 'mV/K', plausible: { min: -5e-3, max: 0 }, description: 'Temperature coefficient of the threshold (polarity-normalised; negative: VT falls when hotter)' }),
  p({ hardLimit: { min: -5, max: 2 }, name: 'muExp', symbol: 'µ exponent', unit: '', displayUnit: '', plausible: { min: -3, max: 0 }, description: 'Mobility temperature exponent: kp ∝ (T/Tnom)^muExp, T in kelvin (about −1.5)' }),
  p({ hardLimit: { min: 0, max: 1e-6 }, name: 'avt', symbol: 'AVT', unit: 'V·m', displayUnit: 'mV·µm', plausible: { min: 0, max: 50e-9 }, description: 'Pelgrom threshold-matching coefficient: σ(ΔVT) of a pair = avt/√(W·L)' }),
  p({ hardLimit: { min: 0, max: 1e-5 }, name: 'abeta', symbol: 'Aβ', unit: 'm', displayUnit: '%·µm', plausible: { min: 0, max: 1e-7 }, description: 'Pelgrom current-factor matching coefficient: σ(Δβ/β) of a pair = abeta/√(W·L)' }),
  p({ hardLimit: { min: 0, max: 1e-3, exclusiveMin: true }, name: 'lmin', symbol: 'Lmin', unit: 'm', displayUnit: 'µm', plausible: { min: 10e-9, max: 20e-6 }, description: 'Minimum drawn gate length' }),
  p({ hardLimit: { min: 0, max: 1e-3, exclusiveMin: true }, name: 'wmin', symbol: 'Wmin', unit: 'm', displayUnit: 'µm', plausible: { min: 10e-9, max: 100e-6 }, description: 'Minimum drawn width of one finger' }),
  p({ hardLimit: { min: 0, max: 1e-5, exclusiveMin: true }, name: 'wgrid', symbol: 'W grid', unit: 'm', displayUnit: 'nm', plausible: { min: 0.1e-9, max: 1e-6 }, description: 'Drawing grid the width of a finger snaps to' }),
  p({ hardLimit: { min: 0, max: 1e9 }, name: 'jg', symbol: 'JG', unit: 'A/m²', displayUnit: 'A/m²', plausible: { min: 0, max: 1e6 }, optional: true, description: 'Gate-leakage current density at vdd (gate current = jg·W·L); taken as given, no temperature law' }),
  p({ hardLimit: { min: 0, max: 1e6 }, name: 'js', symbol: 'JS', unit: 'A/m²', displayUnit: 'fA/µm²', plausible: { min: 0, max: 10 }, optional: true, description: 'Drain-junction leakage density at vdd (current = js·W·ldiff); taken as given, no temperature law' }),
  // Short-channel terms of the all-region model (docs/model.md §6.3); each optional, absent = long channel.
  p({ hardLimit: { min: -1e-6, max: 1e-6 }, name: 'dl', symbol: 'ΔL', unit: 'm', displayUnit: 'nm', plausible: { min: -50e-9, max: 100e-9 }, optional: true, description: 'Length reduction: Leff = L − ΔL (all-region model)' }),
  p({ hardLimit: { min: -1e-6, max: 1e-6 }, name: 'dw', symbol: 'ΔW', unit: 'm', displayUnit: 'nm', plausible: { min: -50e-9, max: 100e-9 }, optional: true, description: 'Width reduction per finger: Weff = W − fingers·ΔW (all-region model)' }),
  p({ hardLimit: { min: 0, max: 20 }, name: 'theta0', symbol: 'θ0', unit: '1/V', displayUnit: '1/V', plausible: { min: 0, max: 2 }, optional: true, description: 'Mobility degradation by the vertical field: ID ÷ (1 + θ·VOV), θ = θ0 + θ1/Leff' }),
  p({ hardLimit: { min: 0, max: 1e-4 }, name: 'theta1', symbol: 'θ1', unit: 'm/V', displayUnit: 'µm/V', plausible: { min: 0, max: 1e-6 }, optional: true, description: 'Velocity saturation, θ1 ≈ 1/Esat: the part of θ that grows as 1/Leff; also lowers VDSsat' }),
  p({ hardLimit: { min: 0, max: 100 }, name: 'theta2', symbol: 'θ2', unit: '1/V²', displayUnit: '1/V²', plausible: { min: 0, max: 5 }, optional: true, description: 'Quadratic mobility degradation: ID ÷ (1 + θ·VOV + θ2·VOV²)' }),
  p({ hardLimit: { min: 0, max: 2 }, name: 'thetaB', symbol: 'θB', unit: '1/V', displayUnit: '1/V', plausible: { min: 0, max: 0.3 }, optional: true, description: 'Mobility degradation by body bias (the depletion charge\'s share of the vertical field): ID ÷ (1 + θB·VSB)' }),
  p({ hardLimit: { min: 0, max: 1 }, name: 'dibl', symbol: 'η', unit: 'V/V', displayUnit: 'mV/V', plausible: { min: 0, max: 0.2 }, optional: true, description: 'Drain-induced barrier lowering at L = lmin: VT falls by η·VDS' }),
  p({ hardLimit: { min: 0, max: 10 }, name: 'diblExp', symbol: 'η exponent', unit: '', displayUnit: '', plausible: { min: 0.5, max: 4 }, optional: true, description: 'η(L) = dibl·((lmin − ΔL)/Leff)^diblExp; 2 when absent' }),
  p({ hardLimit: { min: -0.5, max: 0.5 }, name: 'vtl', symbol: 'ΔVT(L)', unit: 'V', displayUnit: 'mV', plausible: { min: -0.15, max: 0.15 }, optional: true, description: 'Threshold change at L = lmin from the long-channel VT: < 0 roll-off, > 0 reverse short-channel effect' }),
  p({ hardLimit: { min: 0, max: 10 }, name: 'vtlExp', symbol: 'ΔVT(L) exponent', unit: '', displayUnit: '', plausible: { min: 0.5, max: 4 }, optional: true, description: 'ΔVT(L) = vtl·((lmin − ΔL)/Leff)^vtlExp; 2 when absent' }),
  p({ hardLimit: { min: -0.5, max: 2 }, name: 'nl', symbol: 'Δn(L)', unit: '', displayUnit: '', plausible: { min: 0, max: 0.5 }, optional: true, description: 'Rise of the slope factor at L = lmin over the long-channel n: Δn(L) = nl·((lmin − ΔL)/Leff)²' }),
  p({ hardLimit: { min: 0, max: 1e-5 }, name: 'pclm', symbol: 'Pclm', unit: 'm', displayUnit: 'nm', plausible: { min: 0, max: 1e-6 }, optional: true, description: 'Channel-length modulation length: output conductance falls with Leff, VDS − VDSsat and the overdrive' }),
  p({ hardLimit: { min: -1e-5, max: 1e-5 }, name: 'muExpL', symbol: 'µ exponent/L', unit: 'm', displayUnit: 'µm', plausible: { min: -1e-6, max: 1e-6 }, optional: true, description: 'Length dependence of the mobility temperature exponent: muExp + muExpL/Leff' }),
  // Junction bias dependence and leakage terms.
  p({ hardLimit: { min: 0.05, max: 2 }, name: 'pb', symbol: 'PB', unit: 'V', displayUnit: 'V', plausible: { min: 0.4, max: 1.2 }, optional: true, description: 'Junction built-in potential: C = C0/(1 + VR/PB)^M; 0.8 V when absent' }),
  p({ hardLimit: { min: 0, max: 1 }, name: 'mj', symbol: 'MJ', unit: '', displayUnit: '', plausible: { min: 0.2, max: 0.6 }, optional: true, description: 'Grading coefficient of the junction area capacitance; 0.5 when absent' }),
  p({ hardLimit: { min: 0, max: 1 }, name: 'mjsw', symbol: 'MJSW', unit: '', displayUnit: '', plausible: { min: 0.1, max: 0.5 }, optional: true, description: 'Grading coefficient of the junction sidewall capacitance; 0.33 when absent' }),
  p({ hardLimit: { min: 0, max: 1 }, name: 'agidl', symbol: 'AGIDL', unit: 'S', displayUnit: 'nS', plausible: { min: 0, max: 1e-6 }, optional: true, description: 'Gate-induced drain leakage prefactor (BSIM form); no GIDL when absent' }),
  p({ hardLimit: { min: 1e7, max: 1e11 }, name: 'bgidl', symbol: 'BGIDL', unit: 'V/m', displayUnit: 'V/m', plausible: { min: 1e8, max: 1e10 }, optional: true, description: 'GIDL field exponent; 2.3e9 V/m when absent' }),
  p({ hardLimit: { min: -2, max: 5 }, name: 'egidl', symbol: 'EGIDL', unit: 'V', displayUnit: 'V', plausible: { min: 0, max: 2 }, optional: true, description: 'GIDL band-bending offset; 0.8 V when absent' }),
] as const satisfies readonly ParameterInfo[];

/** Process-level fields and corner shifts, for the editor and the CSV import. */
export const PROCESS_FIELDS = [
  p({ name: 'tnom', symbol: 'Tnom', unit: '°C', displayUnit: '°C', plausible: { min: -60, max: 200 }, description: 'Temperature at which the parameters were extracted' }),
  p({ hardLimit: { min: 0, max: 100, exclusiveMin: true }, name: 'vdd', symbol: 'VDD', unit: 'V', displayUnit: 'V', plausible: { min: 0.3, max: 20 }, description: 'Nominal supply voltage (off current is taken at VDS = vdd)' }),
  p({ name: 'tempRange.min', symbol: 'Tmin', unit: '°C', displayUnit: '°C', plausible: { min: -200, max: 300 }, optional: true, description: 'Lowest operating temperature' }),
  p({ name: 'tempRange.max', symbol: 'Tmax', unit: '°C', displayUnit: '°C', plausible: { min: -200, max: 300 }, optional: true, description: 'Highest operating temperature' }),
  p({ hardLimit: { min: -2, max: 2 }, name: 'dvt', symbol: 'ΔVT', unit: 'V', displayUnit: 'mV', plausible: { min: -0.5, max: 0.5 }, description: 'Corner shift of the (polarity-normalised) threshold: > 0 slower' }),
  p({ hardLimit: { min: 0, max: 100, exclusiveMin: true }, name: 'kpScale', symbol: 'KP ×', unit: '', displayUnit: '', plausible: { min: 0.1, max: 10, exclusiveMin: true }, description: 'Corner factor on kp: < 1 slower' }),
] as const satisfies readonly ParameterInfo[];

type DeviceParameterName = (typeof DEVICE_PARAMETERS)[number]['name'];

/** Looks up the description of a parameter by name (device parameters and process fields). */
export function parameterInfo(name: string): ParameterInfo | undefined {
  return [...DEVICE_PARAMETERS, ...PROCESS_FIELDS].find((info) => info.name === name);
}

function boundedNumber(info: ParameterInfo) {
  const unit = info.unit === '' ? '' : ` ${info.unit}`;
  const limit = info.hardLimit;
  const range = `${limit.min}${unit} … ${limit.max}${unit}`;
  const base = z
    .number({ error: `${info.name} must be a number${info.unit ? ` in ${info.unit}` : ''}` })
    .max(limit.max, { error: `${info.name} must be in ${range}` });
  const bounded = limit.exclusiveMin
    ? base.gt(limit.min, { error: `${info.name} must be above ${limit.min}${unit} (range ${range})` })
    : base.min(limit.min, { error: `${info.name} must be in ${range}` });
  return bounded.describe(`${info.description} [${info.unit || '1'}], accepted ${range}, plausible ${info.plausible.min}${unit} … ${info.plausible.max}${unit}`);
}

function parameter(name: string) {
  const info = parameterInfo(name);
  if (!info) throw new Error(`no parameter ${name}`);
  return boundedNumber(info);
}

const device = (name: DeviceParameterName) => parameter(name);

/** One polarity's parameters at tnom (polarity-normalised). */
export const deviceParamsSchema = z
  .strictObject({
    vt0: device('vt0'),
    kp: device('kp'),
    gamma: device('gamma'),
    twoPhiF: device('twoPhiF'),
    lambda: device('lambda'),
    lRef: device('lRef').optional(),
    n: device('n').optional(),
    tox: device('tox'),
    cgdo: device('cgdo'),
    cj: device('cj'),
    cjsw: device('cjsw'),
    ldiff: device('ldiff'),
    vtTc: device('vtTc'),
    muExp: device('muExp'),
    avt: device('avt'),
    abeta: device('abeta'),
    lmin: device('lmin'),
    wmin: device('wmin'),
    wgrid: device('wgrid'),
    jg: device('jg').optional(),
    js: device('js').optional(),
    dl: device('dl').optional(),
    dw: device('dw').optional(),
    theta0: device('theta0').optional(),
    theta1: device('theta1').optional(),
    theta2: device('theta2').optional(),
    thetaB: device('thetaB').optional(),
    dibl: device('dibl').optional(),
    diblExp: device('diblExp').optional(),
    vtl: device('vtl').optional(),
    vtlExp: device('vtlExp').optional(),
    nl: device('nl').optional(),
    pclm: device('pclm').optional(),
    muExpL: device('muExpL').optional(),
    pb: device('pb').optional(),
    mj: device('mj').optional(),
    mjsw: device('mjsw').optional(),
    agidl: device('agidl').optional(),
    bgidl: device('bgidl').optional(),
    egidl: device('egidl').optional(),
  })
  .superRefine((params, ctx) => {
    if (params.wgrid > params.wmin) {
      ctx.addIssue({ code: 'custom', path: ['wgrid'], message: `wgrid (${params.wgrid} m) must not exceed wmin (${params.wmin} m)` });
    }
    if (params.dl !== undefined && !(params.lmin - params.dl > 0)) {
      ctx.addIssue({ code: 'custom', path: ['dl'], message: `ΔL (${params.dl} m) must be below lmin (${params.lmin} m): Leff = L − ΔL must stay positive` });
    }
    if (params.dw !== undefined && !(params.wmin - params.dw > 0)) {
      ctx.addIssue({ code: 'custom', path: ['dw'], message: `ΔW (${params.dw} m) must be below wmin (${params.wmin} m): Weff must stay positive` });
    }
  })
  .describe('MOS parameters of one polarity at tnom; voltages polarity-normalised (PMOS: VSG, VSD, VBS, vt = −VTP)');
export type DeviceParams = z.infer<typeof deviceParamsSchema>;

export const polaritySchema = z
  .enum(['nmos', 'pmos'], { error: 'polarity must be "nmos" or "pmos"' })
  .describe('nmos or pmos; PMOS voltages are polarity-normalised (VSG, VSD, VBS; vt = −VTP)');
export type Polarity = z.infer<typeof polaritySchema>;

export const cornerShiftSchema = z.strictObject({
  dvt: parameter('dvt'),
  kpScale: parameter('kpScale'),
});
export type CornerShift = z.infer<typeof cornerShiftSchema>;

const nameSchema = (what: string) =>
  z
    .string({ error: `${what} must be text` })
    .trim()
    .min(1, `${what} must not be empty`)
    .max(50, `${what} must have at most 50 characters`);

/** A process corner: a VT shift and a kp factor per polarity. "TT" always means the nominal parameters. */
export const cornerSchema = z.strictObject({
  name: nameSchema('Corner name'),
  nmos: cornerShiftSchema,
  pmos: cornerShiftSchema,
});
export type Corner = z.infer<typeof cornerSchema>;

/** A device flavour, e.g. a native (depletion-mode) NMOS: its own full parameter set; corners apply by polarity. */
export const flavourSchema = z.strictObject({
  name: nameSchema('Flavour name'),
  polarity: polaritySchema,
  description: z.string().max(500).optional(),
  params: deviceParamsSchema,
});
export type Flavour = z.infer<typeof flavourSchema>;

const temperature = (name: 'tempRange.min' | 'tempRange.max' | 'tnom') => parameter(name);

const spiceModelName = z
  .string({ error: 'A SPICE model name must be text' })
  .trim()
  .regex(/^[A-Za-z][A-Za-z0-9_.]{0,49}$/, 'A SPICE model name starts with a letter and holds letters, digits, _ and . only (at most 50)');

/**
 * The names the foundry's (or the designer's) SPICE model cards give each device type, for netlists the
 * product writes: one per polarity and one per flavour. Absent: "<process>_nmos", "<process>_pmos",
 * "<process>_<flavour>".
 */
export const spiceModelsSchema = z
  .strictObject({
    nmos: spiceModelName,
    pmos: spiceModelName,
    flavours: z.record(z.string(), spiceModelName).optional(),
  })
  .describe('SPICE model names per polarity and per flavour, for the netlist export');
export type SpiceModels = z.infer<typeof spiceModelsSchema>;

export const processSchema = z
  .strictObject({
    name: z.string({ error: 'Process name must be text' }).trim().min(1, 'Process name must not be empty').max(100),
    description: z.string().max(2000).optional(),
    tnom: temperature('tnom'),
    vdd: parameter('vdd'),
    tempRange: z.strictObject({ min: temperature('tempRange.min'), max: temperature('tempRange.max') }).optional(),
    nmos: deviceParamsSchema,
    pmos: deviceParamsSchema,
    corners: z.array(cornerSchema).max(20, 'At most 20 corners'),
    flavours: z.array(flavourSchema).max(20, 'At most 20 flavours').optional(),
    spiceModels: spiceModelsSchema.optional(),
  })
  .superRefine((process, ctx) => {
    if (process.tempRange && process.tempRange.min >= process.tempRange.max) {
      ctx.addIssue({ code: 'custom', path: ['tempRange', 'max'], message: 'tempRange.max must be above tempRange.min' });
    }
    const seen = new Set<string>();
    process.corners.forEach((corner, index) => {
      if (seen.has(corner.name)) ctx.addIssue({ code: 'custom', path: ['corners', index, 'name'], message: `Corner ${corner.name} is listed twice` });
      seen.add(corner.name);
      if (corner.name !== 'TT') return;
      for (const polarity of ['nmos', 'pmos'] as const) {
        if (corner[polarity].dvt !== 0) ctx.addIssue({ code: 'custom', path: ['corners', index, polarity, 'dvt'], message: 'TT means the nominal parameters: its dvt must be 0' });
        if (corner[polarity].kpScale !== 1) ctx.addIssue({ code: 'custom', path: ['corners', index, polarity, 'kpScale'], message: 'TT means the nominal parameters: its kpScale must be 1' });
      }
    });
    const flavours = new Set<string>();
    process.flavours?.forEach((flavour, index) => {
      if (flavours.has(flavour.name)) ctx.addIssue({ code: 'custom', path: ['flavours', index, 'name'], message: `Flavour ${flavour.name} is listed twice` });
      flavours.add(flavour.name);
    });
    for (const name of Object.keys(process.spiceModels?.flavours ?? {})) {
      if (!flavours.has(name)) ctx.addIssue({ code: 'custom', path: ['spiceModels', 'flavours', name], message: `spiceModels names a flavour ${name} the process does not have` });
    }
  })
  .describe('A process: parameters per polarity at tnom (°C), supply vdd, corners and optional flavours');
export type Process = z.infer<typeof processSchema>;

/** The corner names a process answers to: "TT" first, then the listed ones. */
export function cornerNames(process: Pick<Process, 'corners'>): string[] {
  return ['TT', ...process.corners.map((c) => c.name).filter((name) => name !== 'TT')];
}
