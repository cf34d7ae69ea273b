import { channelCurrentAt } from './channel-current.js';
import type { PreparedDevice } from './resolve-device.js';

export interface Leakage {
  /** True for a depletion-mode device (VT < 0 at VSB = 0): it conducts at VGS = 0, and that current is not leakage. */
  conductsAtZeroVgs: boolean;
  /** Channel current at VGS = 0, VDS = vdd, VSB = 0 (all-region model), A. */
  idAtZeroVgs: number;
  /** Subthreshold off current = idAtZeroVgs; null for a depletion-mode device. */
  subthreshold: number | null;
  /** Gate leakage jg·W·L, A (0 when the process gives no jg). */
  gate: number;
  /** Drain-junction leakage js·W·ldiff, A (0 when the process gives no js). */
  junction: number;
  /** Off current: subthreshold + gate + junction; null for a depletion-mode device. */
  ioff: number | null;
  /** On current at VGS = VDS = vdd, VSB = 0, A. */
  ion: number;
  /** ion/ioff; null for a depletion-mode device. */
  ionIoff: number | null;
}

/**
 * Off-state leakage of a device of width w and length l at the device's corner and temperature:
 * subthreshold channel current at VGS = 0, VDS = vdd, VSB = 0, computed with the all-region model
 * whatever model the request chose (the square law has no physical subthreshold region), plus
 * jg·W·L and js·W·ldiff as given by the process (no temperature law for those two).
 */
export function leakage(device: PreparedDevice, w: number, l: number): Leakage {
  const { params, vdd } = device;
  const idAtZeroVgs = channelCurrentAt(device, 'all-region', w, l, 0, vdd, 0);
  const ion = channelCurrentAt(device, 'all-region', w, l, vdd, vdd, 0);
  const gate = (params.jg ?? 0) * w * l;
  const junction = (params.js ?? 0) * w * params.ldiff;
  const conductsAtZeroVgs = device.vtZeroBias < 0;
  const ioff = conductsAtZeroVgs ? null : idAtZeroVgs + gate + junction;
  return {
    conductsAtZeroVgs,
    idAtZeroVgs,
    subthreshold: conductsAtZeroVgs ? null : idAtZeroVgs,
    gate,
    junction,
    ioff,
    ion,
    ionIoff: ioff !== null && ioff > 0 ? ion / ioff : null,
  };
}
