import { betaOf, channelOf, slopeFactorOf, thresholdOf } from './channel.js';
import { type CurrentModel, drainCurrent } from './drain-current.js';
import { type PreparedDevice } from './resolve-device.js';

/** ID in amperes of a prepared device of drawn width w and length l at VGS, VDS, VSB (polarity-normalised), DIBL included. */
export function channelCurrentAt(device: PreparedDevice, model: CurrentModel, w: number, l: number, vgs: number, vds: number, vsb: number, fingers = 1): number {
  const channel = channelOf(device, model, w, l, fingers);
  const vov = vgs - thresholdOf(device, channel, vsb, vds);
  return drainCurrent(model, betaOf(channel, vsb), slopeFactorOf(device, channel, vsb), device.ut, channel.lambda, vov, vds, channel.terms);
}
