import { lambdaAtLength } from './channel-length-modulation.js';
import { type CurrentModel, drainCurrent } from './drain-current.js';
import { type PreparedDevice, thresholdAt } from './resolve-device.js';
import { slopeFactor } from './slope-factor.js';

/** ID in amperes of a prepared device of width w and length l at VGS, VDS, VSB (polarity-normalised). */
export function channelCurrentAt(device: PreparedDevice, model: CurrentModel, w: number, l: number, vgs: number, vds: number, vsb: number): number {
  const vov = vgs - thresholdAt(device, vsb);
  return drainCurrent(model, (device.kp * w) / l, slopeFactor(device.params, vsb), device.ut, lambdaAtLength(device.params, l), vov, vds);
}
