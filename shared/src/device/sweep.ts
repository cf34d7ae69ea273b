import { SWEEP_FIELDS, type SweepField, type SweepParam, type SweepRequest } from '../schemas/sweep.js';
import type { Warning } from '../schemas/warning.js';
import type { Process } from '../schemas/process.js';
import { celsiusToKelvin } from '../units/temperature.js';
import { channelOf } from './channel.js';
import { type CurrentModel, allRegionColumns, maskOf, squareLawColumns } from './drain-current.js';
import { EngineError } from './errors.js';
import { kpAtTemperature } from './mobility.js';
import { overdriveForCurrent, overdriveForGmId } from './overdrive.js';
import { prepareDevice } from './resolve-device.js';
import { say } from './say.js';
import { mobilityExponentAt } from './short-channel.js';
import { slopeFactor } from './slope-factor.js';
import { gmbRatioOf } from './small-signal.js';
import { MAX_WIDTH, type Sizing, checkLength, solveSize } from './solve.js';
import { Failures, cautions } from './sweep-cautions.js';
import { fieldColumns } from './sweep-fields.js';
import { type KernelOutputs, Scratch, type SeriesInputs, one } from './sweep-inputs.js';
import { sweepValues } from './sweep-values.js';
import { thermalVoltage } from './thermal-voltage.js';
import { bodyEffect, thresholdVoltage } from './threshold.js';

/** One series of a sweep in columns: the swept values and one Float64Array per field (NaN where a point has no answer). */
export interface SweepSeriesColumns {
  corner: string;
  /** °C; null in a temperature sweep. */
  temperature: number | null;
  values: Float64Array;
  /** The requested fields; "saturated" as 1/0; "ic" also present when "region" was asked for (the region is read from it). */
  columns: Partial<Record<SweepField, Float64Array>>;
  warnings: Warning[];
}

export interface SweepColumns {
  param: SweepParam;
  hold: 'id' | 'w';
  fields: readonly SweepField[];
  /** The device sized by the request alone, at its corner and temperature: the chosen point. */
  base: Sizing;
  series: SweepSeriesColumns[];
}

/**
 * The public sweep: the device of the request, swept in one parameter, one series per corner × temperature.
 * hold "w": the width (and, unless the gate is swept, VGS) of the request's own sizing are kept and the
 * current follows (ID versus VGS, versus temperature at fixed VGS …). hold "id": at every point the device
 * is re-sized for the request's ID (W/L versus VOV …), unsnapped so the curve is smooth; a swept vov, vgs or
 * gmId replaces the request's constraint. Every figure is analytic; a point with no answer is NaN in its
 * columns and counted in the series warnings. The request must already be parsed (sweepRequestSchema).
 */
export function sweep(request: SweepRequest & { model: CurrentModel }, process: Process): SweepColumns {
  const baseDevice = prepareDevice(process, request.polarity, { corner: request.corner, temperature: request.temperature, flavour: request.flavour });
  const base = solveSize(baseDevice, request.model, request);
  const fields = request.fields ?? SWEEP_FIELDS;
  const values = sweepValues(request.sweep);
  const corners = request.corners ?? [request.corner];
  const temperatures: (number | null)[] = request.sweep.param === 'temperature' ? [null] : (request.temperatures ?? [baseDevice.temperature]);
  const scratch = Scratch.forPoints(values.length);
  const series: SweepSeriesColumns[] = [];
  for (const corner of corners) {
    for (const temperature of temperatures) series.push(sweepSeries(request, process, base, corner, temperature, values, fields, scratch));
  }
  return { param: request.sweep.param, hold: request.hold, fields, base, series };
}

type GateMode = 'swept-vgs' | 'swept-vov' | 'swept-gmId' | 'held-vgs' | 'given-vov' | 'given-vgs' | 'given-gmId' | 'solve-for-id';

function sweepSeries(
  request: SweepRequest & { model: CurrentModel },
  process: Process,
  base: Sizing,
  corner: string,
  temperature: number | null,
  values: Float64Array,
  fields: readonly SweepField[],
  scratch: Scratch,
): SweepSeriesColumns {
  const device = prepareDevice(process, request.polarity, {
    corner,
    temperature: temperature ?? values[0],
    flavour: request.flavour,
    cornerField: request.corners ? `corners.${request.corners.indexOf(corner)}` : 'corner',
  });
  const { params, tnomK, dvt, kpScale, vdd } = device;
  const { model, hold } = request;
  const param = request.sweep.param;
  const count = values.length;
  const failures = new Failures(count);
  const { gamma, twoPhiF } = params;
  const squareLaw = model === 'square-law';
  const channel = channelOf(device, model, base.w, request.l, base.fingers);
  const { terms } = channel;

  // 1. Conditions: the series' own, and the swept one point by point.
  const inputs: SeriesInputs = {
    tempC: param === 'temperature' ? values : one(device.temperature),
    ut: one(device.ut),
    kp: one(channel.kp),
    vtZeroBias: one(device.vtZeroBias),
    vsb: param === 'vsb' ? values : one(request.vsb),
    vt: one(Number.NaN),
    n: one(slopeFactor(params, request.vsb) + terms.nShift),
    gmbRatio: one(gmbRatioOf(model, params, request.vsb)),
    l: param === 'l' ? values : one(request.l),
    leff: one(channel.leff),
    lambda: one(channel.lambda),
    theta: one(terms.theta),
    theta2: one(terms.theta2),
    esat: one(terms.esat),
    clm: one(terms.clm),
    eta: one(terms.eta),
    vtShift: one(terms.vtShift),
    vds: param === 'vds' ? values : one(request.vds),
    w: one(base.w),
    fingers: base.fingers,
    dw: squareLaw ? 0 : (params.dw ?? 0),
    beta: one(Number.NaN),
    vov: one(Number.NaN),
  };
  if (param === 'temperature') {
    const { ut, kp, vtZeroBias } = scratch;
    const muExp = squareLaw ? params.muExp : mobilityExponentAt(params, channel.leff);
    for (let i = 0; i < count; i++) {
      const tempK = celsiusToKelvin(values[i]);
      ut[i] = thermalVoltage(tempK);
      kp[i] = kpAtTemperature(params.kp, tempK, tnomK, muExp, kpScale);
      vtZeroBias[i] = thresholdVoltage(params, 0, tempK, tnomK, dvt);
    }
    Object.assign(inputs, { ut, kp, vtZeroBias });
  }
  if (param === 'vsb') {
    const { vt, n, gmbRatio } = scratch;
    const vt0 = device.vtZeroBias;
    for (let i = 0; i < count; i++) {
      try {
        vt[i] = vt0 + bodyEffect(gamma, twoPhiF, values[i]);
        n[i] = slopeFactor(params, values[i]) + terms.nShift;
        gmbRatio[i] = gmbRatioOf(model, params, values[i]);
      } catch (error) {
        failures.add(i, error);
      }
    }
    Object.assign(inputs, { vt, n, gmbRatio });
  } else {
    const body = bodyEffect(gamma, twoPhiF, request.vsb);
    if (param === 'temperature') {
      const { vt } = scratch;
      for (let i = 0; i < count; i++) vt[i] = inputs.vtZeroBias[i] + body;
      inputs.vt = vt;
    } else {
      inputs.vt = one(device.vtZeroBias + body);
    }
  }
  if (param === 'l') {
    const { kp, leff, lambda, theta, theta2, esat, clm, eta, vtShift, n } = scratch;
    const bodyN = slopeFactor(params, request.vsb);
    for (let i = 0; i < count; i++) {
      try {
        checkLength(device, values[i], 'sweep');
        const at = channelOf(device, model, 1, values[i], 0, 'sweep');
        kp[i] = at.kp;
        leff[i] = at.leff;
        lambda[i] = at.lambda;
        theta[i] = at.terms.theta;
        theta2[i] = at.terms.theta2;
        esat[i] = at.terms.esat;
        clm[i] = at.terms.clm;
        eta[i] = at.terms.eta;
        vtShift[i] = at.terms.vtShift;
        n[i] = bodyN + at.terms.nShift;
      } catch (error) {
        failures.add(i, error);
      }
    }
    Object.assign(inputs, { kp, leff, lambda, theta, theta2, esat, clm, eta, vtShift, n });
  }
  inputs.vt = shiftThreshold(inputs, count);
  // θB: β ÷ (1 + θB·VSB) (betaOf in channel.ts), folded into kp so that every β below carries it.
  if (terms.thetaB !== 0) inputs.kp = bodyBiasedKp(inputs.kp, inputs.vsb, terms.thetaB, count);

  // 2. Width and gate: hold "w" keeps the request's sized width; hold "id" sizes per metre of width and scales below.
  const gateSwept = param === 'vov' || param === 'vgs' || param === 'gmId';
  const perWidth = hold === 'id' && (gateSwept || base.constraint !== 'w');
  const mode: GateMode = gateSwept ? (`swept-${param}` as GateMode) : hold === 'w' ? 'held-vgs' : base.constraint === 'w' ? 'solve-for-id' : (`given-${base.constraint}` as GateMode);
  const given = mode.startsWith('given-') ? ((request as Record<string, unknown>)[base.constraint] as number) : Number.NaN;
  inputs.beta = betaColumn(inputs, perWidth, count, scratch.beta);
  inputs.vov = overdriveColumn(mode, model, values, given, base.vgs, request.id, vdd, inputs, count, scratch.vov, failures);

  // 3. The kernel: ID, gm, gds, gm/ID, VDSsat for every point, analytic.
  const outputs: KernelOutputs = {
    id: new Float64Array(count),
    gm: new Float64Array(count),
    gds: new Float64Array(count),
    gmId: new Float64Array(count),
    vdsat: fields.includes('vdsat') ? new Float64Array(count) : scratch.vdsat,
  };
  const kernel = { ...inputs, ...outputs };
  if (model === 'square-law') squareLawColumns(count, kernel);
  else allRegionColumns(count, kernel);
  if (perWidth) scaleToCurrent(request.id, inputs, outputs, count, scratch.w, failures);

  // 4. The fields asked for, then the cautions.
  const deviceAt = param === 'temperature' ? (i: number) => prepareDevice(process, request.polarity, { corner, temperature: values[i], flavour: request.flavour }) : () => device;
  const columns = fieldColumns(fields, inputs, outputs, deviceAt, count);
  for (const column of Object.values(columns)) failures.blank(column);
  const warnings = [...cautions(model, inputs, outputs, device, failures, count), ...failures.warnings(param)];
  return { corner, temperature, values, columns, warnings };
}

/** VT with its length's shift and lowered by DIBL, VT + ΔVT(L) − η·VDS, per point where any of them varies. */
function shiftThreshold(inputs: SeriesInputs, count: number): Float64Array {
  const { vt, eta, vds, vtShift } = inputs;
  if (eta.length === 1 && eta[0] === 0 && vtShift.length === 1 && vtShift[0] === 0) return vt;
  if (vt.length === 1 && eta.length === 1 && vds.length === 1 && vtShift.length === 1) return one(vt[0] + vtShift[0] - eta[0] * vds[0]);
  const [mt, me, md, ms] = [vt, eta, vds, vtShift].map(maskOf);
  const shifted = new Float64Array(count);
  for (let i = 0; i < count; i++) shifted[i] = vt[i & mt] + vtShift[i & ms] - eta[i & me] * vds[i & md];
  return shifted;
}

/** kp ÷ (1 + θB·VSB) per point (one value when neither column varies). */
function bodyBiasedKp(kp: Float64Array, vsb: Float64Array, thetaB: number, count: number): Float64Array {
  if (kp.length === 1 && vsb.length === 1) return one(kp[0] / (1 + thetaB * vsb[0]));
  const [mk, mv] = [kp, vsb].map(maskOf);
  const into = new Float64Array(count);
  for (let i = 0; i < count; i++) into[i] = kp[i & mk] / (1 + thetaB * vsb[i & mv]);
  return into;
}

/** β = kp·Weff/Leff per point (hold "w"), or kp/Leff alone (per metre of effective width, hold "id"; scaled once the current is known). */
function betaColumn(inputs: SeriesInputs, perWidth: boolean, count: number, into: Float64Array): Float64Array {
  const { kp, w, leff, fingers, dw } = inputs;
  const weff = perWidth ? 1 : w[0] - fingers * dw;
  if (kp.length === 1 && leff.length === 1) return one((kp[0] * weff) / leff[0]);
  const [mk, ml] = [kp, leff].map(maskOf);
  for (let i = 0; i < count; i++) into[i] = (kp[i & mk] * weff) / leff[i & ml];
  return into;
}

/** Hold "id": from the current per metre of effective width to the drawn width that carries the target, and the figures that scale with it. */
function scaleToCurrent(target: number, inputs: SeriesInputs, outputs: KernelOutputs, count: number, w: Float64Array, failures: Failures): void {
  const { leff, kp, fingers, dw } = inputs;
  const { id, gm, gds } = outputs;
  const [ml, mk] = [leff, kp].map(maskOf);
  const beta = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const weff = target / id[i];
    w[i] = weff + fingers * dw;
    beta[i] = (kp[i & mk] * weff) / leff[i & ml];
    id[i] = target;
    gm[i] *= weff;
    gds[i] *= weff;
    if (!(w[i] <= MAX_WIDTH)) failures.add(i, new EngineError('W_TOO_LARGE', `This point needs W above ${say(MAX_WIDTH, 'm')}`, 'sweep'));
  }
  inputs.w = w;
  inputs.beta = beta;
}

/** VOV per point for the gate mode of the series; a point that has no answer is recorded. */
function overdriveColumn(
  mode: GateMode,
  model: CurrentModel,
  values: Float64Array,
  given: number,
  heldVgs: number,
  targetId: number,
  vdd: number,
  inputs: SeriesInputs,
  count: number,
  into: Float64Array,
  failures: Failures,
): Float64Array {
  const { vt, n, ut, vds, beta, lambda, theta, theta2, esat, clm, eta } = inputs;
  const [mt, mn, mu, md, mb, ml] = [vt, n, ut, vds, beta, lambda].map(maskOf);
  const [mTheta, mTheta2, mEsat, mClm, mEta] = [theta, theta2, esat, clm, eta].map(maskOf);
  const terms = { theta: 0, theta2: 0, thetaB: 0, esat: Infinity, clm: 0, eta: 0, vtShift: 0, nShift: 0 };
  switch (mode) {
    case 'swept-vov':
      return values;
    case 'given-vov':
      return one(given);
    case 'swept-vgs':
      for (let i = 0; i < count; i++) into[i] = values[i] - vt[i & mt];
      return into;
    case 'held-vgs':
    case 'given-vgs': {
      const gate = mode === 'held-vgs' ? heldVgs : given;
      if (vt.length === 1) return one(gate - vt[0]);
      for (let i = 0; i < count; i++) into[i] = gate - vt[i];
      return into;
    }
    default:
      break;
  }
  for (let i = 0; i < count; i++) {
    terms.theta = theta[i & mTheta];
    terms.theta2 = theta2[i & mTheta2];
    terms.esat = esat[i & mEsat];
    terms.clm = clm[i & mClm];
    terms.eta = eta[i & mEta];
    try {
      if (mode === 'solve-for-id') {
        into[i] = overdriveForCurrent(model, beta[i & mb], n[i & mn], ut[i & mu], lambda[i & ml], vds[i & md], targetId, terms);
        if (vt[i & mt] + into[i] > vdd) throw new EngineError('ID_NOT_REACHABLE_BELOW_VDD', `The width cannot carry ${say(targetId, 'A')} with VGS ≤ vdd = ${say(vdd, 'V')}`, 'id');
      } else {
        into[i] = overdriveForGmId(model, n[i & mn], ut[i & mu], vds[i & md], mode === 'swept-gmId' ? values[i] : given, terms);
      }
    } catch (error) {
      into[i] = Number.NaN;
      failures.add(i, error);
    }
  }
  return into;
}

