import { channelCurrentAt } from './channel-current.js';
import { oxideCapacitance } from './capacitance.js';
import { intrinsicCarrierDensity } from './derive-process.js';
import type { PreparedDevice } from './resolve-device.js';

/** Leakage terms computed from a first-order law rather than taken from the model's own current. */
export type LeakageEstimate = 'gate' | 'junction' | 'gidl';

export interface Leakage {
  /** True for a depletion-mode device (VT < 0 at VSB = 0): it conducts at VGS = 0, and that current is not leakage. */
  conductsAtZeroVgs: boolean;
  /** Channel current at VGS = 0, VDS = vdd, VSB = 0 (all-region model, DIBL included), A. */
  idAtZeroVgs: number;
  /** Subthreshold off current = idAtZeroVgs; null for a depletion-mode device. */
  subthreshold: number | null;
  /** Off-state gate leakage through the drain overlap, jg·W·(cgdo/Cox), A (0 when the process gives no jg). */
  gate: number;
  /** Drain-junction leakage js·W·ldiff at this temperature (js given at tnom, scaled as ni²), A. */
  junction: number;
  /** Gate-induced drain leakage (BSIM form) at VGS = 0, VDS = vdd, A (0 when the process gives no agidl). */
  gidl: number;
  /** Off current: subthreshold + gate + junction + GIDL; null for a depletion-mode device. */
  ioff: number | null;
  /** On current at VGS = VDS = vdd, VSB = 0, A. */
  ion: number;
  /** ion/ioff; null for a depletion-mode device. */
  ionIoff: number | null;
  /** Which of the terms above are first-order estimates (present and non-zero); the subthreshold term is the model's. */
  estimates: LeakageEstimate[];
}

/** GIDL field exponent and band-bending offset when the profile gives none: BSIM4's defaults (BSIM4 manual, UC Berkeley, 2009, from memory). */
export const DEFAULT_GIDL = Object.freeze({ bgidl: 2.3e9, egidl: 0.8 });

/**
 * Junction saturation current density at T from its value at Tnom: the diffusion current scales as ni²,
 * ∝ T³·exp(−Eg(T)/kT) (Sze & Ng, Physics of Semiconductor Devices, 3rd ed., Wiley, 2007, ch. 2): about ×1e5
 * from 27 to 125 °C.
 */
export function junctionLeakageFactor(tempK: number, tnomK: number): number {
  return (intrinsicCarrierDensity(tempK) / intrinsicCarrierDensity(tnomK)) ** 2;
}

/**
 * GIDL = agidl·W·E·exp(−bgidl/E), E = (VDG − egidl)/(3·tox), zero when VDG ≤ egidl (BSIM4's GIDL law without its
 * drain–body factor; BSIM4 manual, UC Berkeley, 2009, from memory).
 */
export function gateInducedDrainLeakage(params: { agidl?: number; bgidl?: number; egidl?: number; tox: number }, w: number, vdg: number): number {
  if (!params.agidl) return 0;
  const field = (vdg - (params.egidl ?? DEFAULT_GIDL.egidl)) / (3 * params.tox);
  return field > 0 ? params.agidl * w * field * Math.exp(-(params.bgidl ?? DEFAULT_GIDL.bgidl) / field) : 0;
}

/**
 * Off-state leakage of a device of width w and length l (drawn) at the device's corner and temperature:
 * the subthreshold channel current at VGS = 0, VDS = vdd, VSB = 0 with the all-region model whatever model
 * the request chose (the square law has no physical subthreshold region), DIBL included; plus the off-state
 * gate current through the drain overlap, the drain-junction leakage with its temperature law, and GIDL.
 */
export function leakage(device: PreparedDevice, w: number, l: number, fingers = 1): Leakage {
  const { params, vdd } = device;
  const idAtZeroVgs = channelCurrentAt(device, 'all-region', w, l, 0, vdd, 0, fingers);
  const ion = channelCurrentAt(device, 'all-region', w, l, vdd, vdd, 0, fingers);
  const overlapLength = params.cgdo / oxideCapacitance(params.tox);
  const gate = (params.jg ?? 0) * w * overlapLength;
  const junction = (params.js ?? 0) * w * params.ldiff * junctionLeakageFactor(device.tempK, device.tnomK);
  const gidl = gateInducedDrainLeakage(params, w, vdd);
  const conductsAtZeroVgs = device.vtZeroBias < 0;
  const ioff = conductsAtZeroVgs ? null : idAtZeroVgs + gate + junction + gidl;
  const estimates = (['gate', 'junction', 'gidl'] as const).filter((term) => ({ gate, junction, gidl })[term] > 0);
  return {
    conductsAtZeroVgs,
    idAtZeroVgs,
    subthreshold: conductsAtZeroVgs ? null : idAtZeroVgs,
    gate,
    junction,
    gidl,
    ioff,
    ion,
    ionIoff: ioff !== null && ioff > 0 ? ion / ioff : null,
    estimates,
  };
}
