import type { DeviceParams } from '../schemas/process.js';

/**
 * Constant-field scaling after R. H. Dennard, F. H. Gaensslen, H.-N. Yu, V. L. Rideout, E. Bassous,
 * A. R. LeBlanc, "Design of ion-implanted MOSFET's with very small physical dimensions", IEEE JSSC SC-9(5),
 * 256–268, October 1974, table I: dimensions, voltages and currents by 1/κ, doping by κ.
 */
export function dennardRatios(kappa: number) {
  return {
    /** tox, L, W */
    dimension: 1 / kappa,
    /** NA */
    doping: kappa,
    voltage: 1 / kappa,
    current: 1 / kappa,
    /** εA/t */
    capacitance: 1 / kappa,
    /** VC/I */
    delay: 1 / kappa,
    /** VI */
    powerPerCircuit: 1 / (kappa * kappa),
    /** VI/A */
    powerDensity: 1,
  };
}

export interface ScalableDevice {
  params: DeviceParams;
  w: number;
  l: number;
  vgs: number;
  vds: number;
  vsb: number;
  vdd: number;
  /** Substrate doping NA, m⁻³, when known. */
  substrateDoping?: number;
}

/**
 * A device and its bias scaled by κ at constant field (Dennard et al. 1974). Geometry (W, L, tox, ldiff,
 * lmin, wmin, wgrid, lRef) and voltages (bias, vdd, vt0, 2φF) by 1/κ; doping by κ; so Cox and kp by κ,
 * γ by 1/√κ (γ ∝ √NA/Cox), λ by κ (λ ∝ 1/L), cj by κ (depletion width 1/κ). Unchanged: cgdo and cjsw
 * (per length), n, muExp, vtTc, avt, abeta, jg, js, which Dennard's rules do not cover. The ideal rules
 * scale 2φF and vt0 as voltages although the real 2φF grows by UT·ln κ, and UT does not scale at all:
 * subthreshold behaviour does not follow constant-field scaling (Dennard et al. note this).
 */
export function scaleConstantField(device: ScalableDevice, kappa: number): ScalableDevice {
  const p = device.params;
  const down = (value: number) => value / kappa;
  const params: DeviceParams = {
    ...p,
    vt0: down(p.vt0),
    kp: p.kp * kappa,
    gamma: p.gamma / Math.sqrt(kappa),
    twoPhiF: down(p.twoPhiF),
    lambda: p.lambda * kappa,
    ...(p.lRef === undefined ? {} : { lRef: down(p.lRef) }),
    tox: down(p.tox),
    cj: p.cj * kappa,
    ldiff: down(p.ldiff),
    lmin: down(p.lmin),
    wmin: down(p.wmin),
    wgrid: down(p.wgrid),
  };
  return {
    params,
    w: down(device.w),
    l: down(device.l),
    vgs: down(device.vgs),
    vds: down(device.vds),
    vsb: down(device.vsb),
    vdd: down(device.vdd),
    ...(device.substrateDoping === undefined ? {} : { substrateDoping: device.substrateDoping * kappa }),
  };
}
