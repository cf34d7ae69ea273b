import { EXTRACTION_PARAMETERS, type ExtractionParameter } from '../schemas/extraction.js';
import type { DeviceParams } from '../schemas/process.js';

/** The parameters an extraction can fit (the contract's list); every other field of the profile is taken from the base profile. */
export const FIT_PARAMETERS = EXTRACTION_PARAMETERS;
export type FitParameter = ExtractionParameter;

export interface FitParameterInfo {
  readonly unit: string;
  /** A typical magnitude: the fit works in value/scale, so every parameter moves on the same footing. */
  readonly scale: number;
  /** Bounds of the search, in the unit (a physical device lies well inside). */
  readonly min: number;
  readonly max: number;
}

/** Bounds of the search and the scale of each parameter. Lengths that depend on lmin are set by fitBounds. */
export const FIT_PARAMETER_INFO: Record<FitParameter, FitParameterInfo> = {
  vt0: { unit: 'V', scale: 0.5, min: -1.5, max: 2 },
  kp: { unit: 'A/V²', scale: 1e-4, min: 1e-6, max: 0.1 },
  n: { unit: '', scale: 1, min: 1, max: 3 },
  gamma: { unit: '√V', scale: 0.5, min: 0, max: 3 },
  twoPhiF: { unit: 'V', scale: 0.8, min: 0.3, max: 1.5 },
  lambda: { unit: '1/V', scale: 0.05, min: 0, max: 2 },
  dl: { unit: 'm', scale: 1e-8, min: -1e-7, max: 5e-7 },
  dw: { unit: 'm', scale: 1e-8, min: -5e-8, max: 1e-7 },
  theta0: { unit: '1/V', scale: 0.1, min: 0, max: 5 },
  theta1: { unit: 'm/V', scale: 1e-7, min: 0, max: 1e-5 },
  theta2: { unit: '1/V²', scale: 1, min: 0, max: 20 },
  thetaB: { unit: '1/V', scale: 0.05, min: 0, max: 2 },
  dibl: { unit: 'V/V', scale: 0.02, min: 0, max: 0.5 },
  diblExp: { unit: '', scale: 1, min: 0, max: 6 },
  vtl: { unit: 'V', scale: 0.02, min: -0.4, max: 0.4 },
  vtlExp: { unit: '', scale: 1, min: 0.2, max: 6 },
  nl: { unit: '', scale: 0.1, min: -0.5, max: 2 },
  pclm: { unit: 'm', scale: 1e-8, min: 0, max: 1e-5 },
  vtTc: { unit: 'V/K', scale: 1e-3, min: -0.01, max: 0.005 },
  muExp: { unit: '', scale: 1, min: -4, max: 0.5 },
  muExpL: { unit: 'm', scale: 1e-7, min: -5e-6, max: 5e-6 },
};

/** The bounds of a parameter for a process of minimum length lmin (ΔL must leave a channel at lmin). */
export function fitBounds(name: FitParameter, lmin: number): { min: number; max: number } {
  const { min, max } = FIT_PARAMETER_INFO[name];
  if (name === 'dl') return { min: Math.max(min, -0.5 * lmin), max: Math.min(max, 0.8 * lmin) };
  return { min, max };
}

/** The profile parameters of a fitted vector: the base with the fitted values in. */
export function withFitted(base: DeviceParams, names: readonly FitParameter[], values: readonly number[]): DeviceParams {
  const params: Record<string, number | undefined> = { ...base };
  names.forEach((name, k) => {
    params[name] = values[k];
  });
  return params as DeviceParams;
}
