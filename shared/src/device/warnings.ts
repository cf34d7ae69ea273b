import type { Warning, WarningCode } from '../schemas/warning.js';
import type { CurrentModel } from './drain-current.js';
import type { OperatingPoint } from './operating-point.js';
import { gmIdLimit } from './overdrive.js';
import type { PreparedDevice } from './resolve-device.js';
import { say, sayGmId, voltageNames } from './say.js';
import { hasShortChannelTerms } from './short-channel.js';

/** The thresholds of the warnings, documented in docs/model.md. */
export const WARNING_THRESHOLDS = {
  /** Square law: warn when VOV < 4·n·UT (moderate inversion and below, where it is wrong by > 10 %). */
  squareLawOverdriveInNUt: 4,
  /** Warn when L < 2·lmin: short-channel effects are absent from the model, or only first-order fits in it. */
  lengthOverLmin: 2,
  /** Warn when gm/ID > 90 % of 1/(n·UT): more W buys little more gm. */
  gmIdFractionOfLimit: 0.9,
} as const;

/** The cautions that apply to an operating point of a device (sizing, corners). */
export function operatingPointWarnings(device: PreparedDevice, model: CurrentModel, op: OperatingPoint): Warning[] {
  const warnings: Warning[] = [];
  const { params } = device;
  const nUt = op.n * op.ut;
  const add = (code: WarningCode, message: string) => warnings.push({ code, message });
  const v = voltageNames(device.polarity);
  if (model === 'square-law' && op.vov < WARNING_THRESHOLDS.squareLawOverdriveInNUt * nUt) {
    add(
      'SQUARE_LAW_NEAR_THRESHOLD',
      `VOV = ${say(op.vov, 'V')} is below 4·n·UT = ${say(4 * nUt, 'V')}: the square law is not valid in moderate and weak inversion (its tail below 2·n·UT is only a patch); use the all-region model here.`,
    );
  }
  if (op.l < WARNING_THRESHOLDS.lengthOverLmin * params.lmin) {
    const modelled = model === 'all-region' && hasShortChannelTerms(params);
    add(
      'L_NEAR_LMIN',
      modelled
        ? `L = ${say(op.l, 'm')} is less than twice lmin (${say(params.lmin, 'm')}): the profile's short-channel terms (ΔL, θ, DIBL, channel-length modulation) are first-order fits and VT roll-off is not modelled; check the current and output resistance with the foundry's models.`
        : `L = ${say(op.l, 'm')} is less than twice lmin (${say(params.lmin, 'm')}): short-channel effects (velocity saturation, DIBL, VT roll-off) are not modelled and the real current and output resistance will differ.`,
    );
  }
  if (!op.saturated) {
    add('VDS_BELOW_VDSSAT', `${v.vds} = ${say(op.vds, 'V')} is below ${v.vdsat} = ${say(op.vdsat, 'V')}: the device is not saturated (triode); gm and ro are lower than a saturated device would give, though ID is met at this ${v.vds}.`);
  }
  if (op.vsb < 0) {
    add('SOURCE_BODY_FORWARD_BIASED', `${v.vsb} = ${say(op.vsb, 'V')} forward-biases the source–body junction: VT is lowered, and the junction conducts once |${v.vsb}| nears 0.5 V.`);
  }
  const limit = gmIdLimit(op.n, op.ut);
  if (op.gmId > WARNING_THRESHOLDS.gmIdFractionOfLimit * limit) {
    add('GM_ID_NEAR_WEAK_INVERSION_LIMIT', `gm/ID = ${sayGmId(op.gmId)} is within 10 % of its weak-inversion limit 1/(n·UT) = ${sayGmId(limit)}: more width buys little more gm, and the device is large and slow.`);
  }
  if (op.leakage.conductsAtZeroVgs) {
    add('DEPLETION_CONDUCTS_AT_VGS0', `This is a depletion-mode device (VT = ${say(device.vtZeroBias, 'V')} at ${v.vsb} = 0): it conducts ${say(op.leakage.idAtZeroVgs, 'A')} at ${v.vgs} = 0, which is its normal current, not leakage; it needs ${v.vgs} below VT to turn off.`);
  }
  if (op.vgs > device.vdd) {
    add('VGS_ABOVE_VDD', `${v.vgs} = ${say(op.vgs, 'V')} is above VDD = ${say(device.vdd, 'V')}: the gate cannot be driven there from this supply.`);
  }
  if (op.vds > device.vdd) {
    add('VDS_ABOVE_VDD', `${v.vds} = ${say(op.vds, 'V')} is above VDD = ${say(device.vdd, 'V')}.`);
  }
  const range = device.tempRange;
  if (range && (device.temperature < range.min || device.temperature > range.max)) {
    add('TEMPERATURE_OUTSIDE_PROCESS_RANGE', `${say(device.temperature, '°C')} is outside the process's range ${range.min} … ${range.max} °C: the parameters were not meant for it.`);
  }
  return warnings;
}
