import { gateCapacitances, junctionCapacitance, transitFrequency } from './capacitance.js';
import { lambdaAtLength } from './channel-length-modulation.js';
import type { CurrentModel } from './drain-current.js';
import { type Leakage, leakage } from './leakage.js';
import { pairMismatch } from './mismatch.js';
import { type PreparedDevice, thresholdAt } from './resolve-device.js';
import { slopeFactor } from './slope-factor.js';
import { type SmallSignal, smallSignal } from './small-signal.js';
import { bodyEffectSlope } from './threshold.js';

export interface Bias {
  /** VGS (PMOS: VSG), V. */
  readonly vgs: number;
  /** VDS > 0 (PMOS: VSD), V. */
  readonly vds: number;
  /** VSB (PMOS: VBS), V; > −2φF. */
  readonly vsb: number;
}

/** Everything the engine reports about a device at one bias point, in SI units (polarity-normalised voltages). */
export interface OperatingPoint extends SmallSignal {
  w: number;
  l: number;
  wOverL: number;
  vgs: number;
  vds: number;
  vsb: number;
  vt: number;
  vov: number;
  n: number;
  ut: number;
  /** kp(T)·W/L, A/V². */
  beta: number;
  /** λ at this L, 1/V. */
  lambda: number;
  cgs: number;
  cgd: number;
  /** Zero-bias drain–body junction capacitance, F. */
  cdb: number;
  /** Zero-bias source–body junction capacitance, F. */
  csb: number;
  ft: number;
  /** Pelgrom σ(ΔVT) of a matched PAIR of this device, V. */
  sigmaVt: number;
  sigmaVtSingle: number;
  sigmaBeta: number;
  sigmaId: number;
  sigmaVos: number;
  ioff: number | null;
  ion: number;
  ionIoff: number | null;
  leakage: Leakage;
}

/** The full operating point of a prepared device of width w and length l (m) at a bias. */
export function operatingPoint(device: PreparedDevice, model: CurrentModel, w: number, l: number, bias: Bias): OperatingPoint {
  const { params, ut } = device;
  const { vgs, vds, vsb } = bias;
  const vt = thresholdAt(device, vsb);
  const vov = vgs - vt;
  const n = slopeFactor(params, vsb);
  const beta = (device.kp * w) / l;
  const lambda = lambdaAtLength(params, l);
  const signal = smallSignal(model, beta, n, ut, lambda, vov, vds, bodyEffectSlope(params.gamma, params.twoPhiF, vsb));
  const { cgs, cgd } = gateCapacitances(w, l, device.cox, params.cgdo);
  const junction = junctionCapacitance(w, params.ldiff, params.cj, params.cjsw);
  const mismatch = pairMismatch({ avt: params.avt, abeta: params.abeta, w, l, gmId: signal.gmId });
  const leak = leakage(device, w, l);
  return {
    w,
    l,
    wOverL: w / l,
    vgs,
    vds,
    vsb,
    vt,
    vov,
    n,
    ut,
    beta,
    lambda,
    ...signal,
    cgs,
    cgd,
    cdb: junction,
    csb: junction,
    ft: transitFrequency(signal.gm, cgs, cgd),
    ...mismatch,
    ioff: leak.ioff,
    ion: leak.ion,
    ionIoff: leak.ionIoff,
    leakage: leak,
  };
}
