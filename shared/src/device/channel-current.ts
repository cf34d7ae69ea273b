import { channelOf } from './channel.js';
import { type CurrentModel, drainCurrent } from './drain-current.js';
import { type PreparedDevice, thresholdAt } from './resolve-device.js';
import { slopeFactor } from './slope-factor.js';

/** ID in amperes of a prepared device of drawn width w and length l at VGS, VDS, VSB (polarity-normalised), DIBL included. */
export function channelCurrentAt(device: PreparedDevice, model: CurrentModel, w: number, l: number, vgs: number, vds: number, vsb: number, fingers = 1): number {
  const channel = channelOf(device, model, w, l, fingers);
  const vov = vgs - (thresholdAt(device, vsb) - channel.terms.eta * vds);
  return drainCurrent(model, channel.beta, slopeFactor(device.params, vsb), device.ut, channel.lambda, vov, vds, channel.terms);
}
