import { type DeviceParams, type Polarity, type Process, cornerNames } from '../schemas/process.js';
import { celsiusToKelvin } from '../units/temperature.js';
import { oxideCapacitance } from './capacitance.js';
import { EngineError } from './errors.js';
import { kpAtTemperature } from './mobility.js';
import { thermalVoltage } from './thermal-voltage.js';
import { thresholdVoltage } from './threshold.js';

/** One device type (polarity or flavour) of a process at one corner and temperature: the numbers every bias point shares. */
export interface PreparedDevice {
  readonly polarity: Polarity;
  readonly flavour?: string;
  readonly corner: string;
  /** °C */
  readonly temperature: number;
  readonly tempK: number;
  readonly tnomK: number;
  /** kT/q at this temperature, V. */
  readonly ut: number;
  /** The nominal parameters (at tnom, TT). */
  readonly params: DeviceParams;
  readonly dvt: number;
  readonly kpScale: number;
  /** VT at VSB = 0 at this corner and temperature: vt0 + dvt + vtTc·(T − Tnom), V. */
  readonly vtZeroBias: number;
  /** kp at this corner and temperature, A/V². */
  readonly kp: number;
  /** F/m² */
  readonly cox: number;
  readonly vdd: number;
  readonly tempRange?: { readonly min: number; readonly max: number };
}

/** The parameters of a polarity or, when `flavour` is given, of that flavour (which must have the polarity). */
export function deviceParamsOf(process: Process, polarity: Polarity, flavour?: string): DeviceParams {
  if (flavour === undefined) return process[polarity];
  const found = process.flavours?.find((f) => f.name === flavour);
  if (!found) {
    const known = process.flavours?.map((f) => f.name).join(', ') || 'none';
    throw new EngineError('UNKNOWN_FLAVOUR', `Process ${process.name} has no flavour "${flavour}" (flavours: ${known})`, 'flavour');
  }
  if (found.polarity !== polarity) {
    throw new EngineError('FLAVOUR_POLARITY_MISMATCH', `Flavour ${flavour} is ${found.polarity.toUpperCase()}, not ${polarity.toUpperCase()}`, 'polarity');
  }
  return found.params;
}

/** The VT shift and kp factor of a corner for a polarity; TT is always the nominal (0, 1). */
export function cornerShiftOf(process: Process, polarity: Polarity, corner: string, field = 'corner'): { dvt: number; kpScale: number } {
  const found = process.corners.find((c) => c.name === corner);
  if (found) return found[polarity];
  if (corner === 'TT') return { dvt: 0, kpScale: 1 };
  throw new EngineError('UNKNOWN_CORNER', `Process ${process.name} has no corner "${corner}" (corners: ${cornerNames(process).join(', ')})`, field);
}

/** Resolves polarity, flavour, corner and temperature (°C; default tnom) of a process into a PreparedDevice. */
export function prepareDevice(
  process: Process,
  polarity: Polarity,
  options: { corner?: string; temperature?: number; flavour?: string; cornerField?: string } = {},
): PreparedDevice {
  const params = deviceParamsOf(process, polarity, options.flavour);
  const corner = options.corner ?? 'TT';
  const { dvt, kpScale } = cornerShiftOf(process, polarity, corner, options.cornerField);
  const temperature = options.temperature ?? process.tnom;
  const tempK = celsiusToKelvin(temperature);
  const tnomK = celsiusToKelvin(process.tnom);
  return {
    polarity,
    flavour: options.flavour,
    corner,
    temperature,
    tempK,
    tnomK,
    ut: thermalVoltage(tempK),
    params,
    dvt,
    kpScale,
    vtZeroBias: thresholdVoltage(params, 0, tempK, tnomK, dvt),
    kp: kpAtTemperature(params.kp, tempK, tnomK, params.muExp, kpScale),
    cox: oxideCapacitance(params.tox),
    vdd: process.vdd,
    tempRange: process.tempRange,
  };
}

/** VT at a source–body voltage: vtZeroBias + γ(√(2φF + VSB) − √(2φF)) (see thresholdVoltage). */
export function thresholdAt(device: PreparedDevice, vsb: number): number {
  return thresholdVoltage(device.params, vsb, device.tempK, device.tnomK, device.dvt);
}
