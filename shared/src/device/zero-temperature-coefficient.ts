import type { Polarity, Process } from '../schemas/process.js';
import { channelCurrentAt } from './channel-current.js';
import { channelOf, thresholdOf } from './channel.js';
import type { CurrentModel } from './drain-current.js';
import { EngineError } from './errors.js';
import { prepareDevice } from './resolve-device.js';

export interface ZtcDevice {
  polarity: Polarity;
  flavour?: string;
  corner?: string;
  model?: CurrentModel;
  w: number;
  l: number;
  /** Fingers of the drawn width; 1 when absent. */
  fingers?: number;
  vds: number;
  vsb: number;
}

export interface ZeroTemperatureCoefficient {
  /** VGS at which ∂ID/∂T = 0, V. */
  vgs: number;
  vov: number;
  /** ID there, A. */
  id: number;
}

/** Half-width of the temperature step of the central difference, K. */
const STEP_K = 0.5;

/**
 * The zero-temperature-coefficient gate voltage at a temperature (°C, default tnom): the VGS at which
 * the falling mobility and the falling VT cancel, ∂ID/∂T = 0 at fixed VDS and VSB. Below it ID rises with
 * temperature, above it ID falls. Found by bisection on a central difference over ±0.5 K, to 1 µV.
 * For the square law in saturation it is VOV = 2·vtTc·T/muExp (T in kelvin), e.g. 0.4 V for
 * vtTc = −1 mV/K, muExp = −1.5 at 300 K. No crossing within VT − 0.3 V … VT + 10 V: EngineError ZTC_NOT_FOUND.
 */
export function zeroTemperatureCoefficientVgs(process: Process, device: ZtcDevice, temperature = process.tnom): ZeroTemperatureCoefficient {
  const model = device.model ?? 'all-region';
  const options = { corner: device.corner, flavour: device.flavour };
  const at = prepareDevice(process, device.polarity, { ...options, temperature });
  const colder = prepareDevice(process, device.polarity, { ...options, temperature: temperature - STEP_K });
  const hotter = prepareDevice(process, device.polarity, { ...options, temperature: temperature + STEP_K });
  const { w, l, vds, vsb } = device;
  const fingers = device.fingers ?? 1;
  const slope = (vgs: number) => channelCurrentAt(hotter, model, w, l, vgs, vds, vsb, fingers) - channelCurrentAt(colder, model, w, l, vgs, vds, vsb, fingers);
  const vt = thresholdOf(at, channelOf(at, model, w, l, fingers), vsb, vds);
  let lo = vt - 0.3;
  let hi = vt + 10;
  if (!(slope(lo) > 0 && slope(hi) < 0)) {
    throw new EngineError('ZTC_NOT_FOUND', 'ID does not change from rising to falling with temperature between VT − 0.3 V and VT + 10 V for this device', 'vgs');
  }
  while (hi - lo > 1e-6) {
    const mid = 0.5 * (lo + hi);
    if (slope(mid) > 0) lo = mid;
    else hi = mid;
  }
  const vgs = 0.5 * (lo + hi);
  return { vgs, vov: vgs - vt, id: channelCurrentAt(at, model, w, l, vgs, vds, vsb, fingers) };
}
