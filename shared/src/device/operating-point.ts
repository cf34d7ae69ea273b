import { DEFAULT_JUNCTION, gateCapacitances, junctionCapacitance, transitFrequency } from './capacitance.js';
import { betaOf, channelOf, slopeFactorOf, thresholdOf } from './channel.js';
import type { CurrentModel } from './drain-current.js';
import { type Leakage, leakage } from './leakage.js';
import { pairMismatch } from './mismatch.js';
import { type PreparedDevice } from './resolve-device.js';
import { type SmallSignal, gmbRatioOf, smallSignal } from './small-signal.js';

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
  /** Effective width and length the current equations use, m (the drawn ones for the square law). */
  weff: number;
  leff: number;
  wOverL: number;
  vgs: number;
  vds: number;
  vsb: number;
  /** Threshold with body effect, corner, temperature and DIBL at this VDS, V. */
  vt: number;
  /** DIBL coefficient at this length, V/V (0 without the short-channel terms). */
  eta: number;
  vov: number;
  n: number;
  ut: number;
  /** kp(T)·Weff/Leff, A/V². */
  beta: number;
  /** λ at this L, 1/V. */
  lambda: number;
  cgs: number;
  cgd: number;
  cgb: number;
  /** Cgs + Cgd + Cgb, F. */
  cgg: number;
  /** Drain–body junction capacitance at VDB = VDS + VSB, F. */
  cdb: number;
  /** Source–body junction capacitance at VSB, F. */
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

/** The full operating point of a prepared device of drawn width w (all fingers) and length l (m) at a bias. */
export function operatingPoint(device: PreparedDevice, model: CurrentModel, w: number, l: number, bias: Bias, fingers = 1): OperatingPoint {
  const { params, ut } = device;
  const { vgs, vds, vsb } = bias;
  const channel = channelOf(device, model, w, l, fingers);
  const { weff, leff, lambda, terms } = channel;
  const beta = betaOf(channel, vsb);
  const vt = thresholdOf(device, channel, vsb, vds);
  const vov = vgs - vt;
  const n = slopeFactorOf(device, channel, vsb);
  const signal = smallSignal(model, beta, n, ut, lambda, vov, vds, gmbRatioOf(model, params, vsb), terms);
  const capacitances = gateCapacitances(weff, leff, device.cox, params.cgdo, { vov, vds, n, ut });
  const grading = { pb: params.pb ?? DEFAULT_JUNCTION.pb, mj: params.mj ?? DEFAULT_JUNCTION.mj, mjsw: params.mjsw ?? DEFAULT_JUNCTION.mjsw };
  const junction = (reverse: number) => junctionCapacitance(w, params.ldiff, params.cj, params.cjsw, { reverse, ...grading });
  const mismatch = pairMismatch({ avt: params.avt, abeta: params.abeta, w, l, gmId: signal.gmId });
  const leak = leakage(device, w, l, fingers);
  return {
    w,
    l,
    weff,
    leff,
    wOverL: w / l,
    vgs,
    vds,
    vsb,
    vt,
    eta: terms.eta,
    vov,
    n,
    ut,
    beta,
    lambda,
    ...signal,
    ...capacitances,
    cdb: junction(vds + vsb),
    csb: junction(vsb),
    ft: transitFrequency(signal.gm, capacitances.cgg),
    ...mismatch,
    ioff: leak.ioff,
    ion: leak.ion,
    ionIoff: leak.ionIoff,
    leakage: leak,
  };
}
