import type { SweepParam } from '../schemas/sweep.js';
import type { Warning, WarningCode } from '../schemas/warning.js';
import { type CurrentModel, maskOf } from './drain-current.js';
import { isEngineError } from './errors.js';
import type { PreparedDevice } from './resolve-device.js';
import type { KernelOutputs, SeriesInputs } from './sweep-inputs.js';
import { WARNING_THRESHOLDS } from './warnings.js';

/** The cautions of a series, each with the number of points it applies to. */
export function cautions(model: CurrentModel, inputs: SeriesInputs, outputs: KernelOutputs, device: PreparedDevice, failures: Failures, count: number): Warning[] {
  const { w, l, vt, vov, vds, vsb, tempC, n, ut, vtZeroBias } = inputs;
  const [mt, mo, md, mn, mu] = [vt, vov, vds, n, ut].map(maskOf);
  const { gmId, vdsat } = outputs;
  const { vdd, tempRange: range } = device;
  const { lmin, wmin } = device.params;
  const squareLaw = model === 'square-law';
  const nearThreshold = WARNING_THRESHOLDS.squareLawOverdriveInNUt;
  const nearLimit = WARNING_THRESHOLDS.gmIdFractionOfLimit;
  const shortL = WARNING_THRESHOLDS.lengthOverLmin * lmin;
  const low = range ? range.min : -Infinity;
  const high = range ? range.max : Infinity;
  const failed = failures.flags;
  const live = count - failures.count;
  /** Points (with an answer) where a condition on one input holds; one test when the input is the same for all. */
  const where = (column: Float64Array, holds: (value: number) => boolean) => {
    if (column.length === 1) return holds(column[0]) ? live : 0;
    let found = 0;
    for (let i = 0; i < count; i++) if (failed[i] === 0 && holds(column[i])) found++;
    return found;
  };
  let unsaturated = 0, nearVt = 0, aboveVdd = 0, nearGmIdLimit = 0;
  for (let i = 0; i < count; i++) {
    if (failed[i] === 1) continue;
    const nUt = n[i & mn] * ut[i & mu];
    const overdrive = vov[i & mo];
    if (vds[i & md] < vdsat[i]) unsaturated++;
    if (squareLaw && overdrive < nearThreshold * nUt) nearVt++;
    if (vt[i & mt] + overdrive > vdd) aboveVdd++;
    if (gmId[i] * nUt > nearLimit) nearGmIdLimit++;
  }
  const narrow = where(w, (value) => value < wmin);
  const short = where(l, (value) => value < shortL);
  const forward = where(vsb, (value) => value < 0);
  const depletion = where(vtZeroBias, (value) => value < 0);
  const outside = where(tempC, (value) => value < low || value > high);
  const counts = [unsaturated, nearVt, aboveVdd, nearGmIdLimit, narrow, short, forward, depletion, outside];
  const warnings: Warning[] = [];
  CAUTIONS.forEach(([code, sentence], k) => {
    if (counts[k] > 0) warnings.push({ code, message: `At ${counts[k]} of ${count} points ${sentence}.` });
  });
  return warnings;
}

/** The sentence of each series caution (the table model's sweeps use them too). */
export const CAUTIONS: readonly (readonly [WarningCode, string])[] = [
  ['VDS_BELOW_VDSSAT', 'VDS is below VDSsat (the device is not saturated)'],
  ['SQUARE_LAW_NEAR_THRESHOLD', 'VOV is below 4·n·UT, where the square law does not hold; use the all-region model'],
  ['VGS_ABOVE_VDD', 'VGS is above vdd'],
  ['GM_ID_NEAR_WEAK_INVERSION_LIMIT', 'gm/ID is within 10 % of its weak-inversion limit 1/(n·UT)'],
  ['W_BELOW_WMIN', 'the width needed is below wmin (sweeps do not snap or widen)'],
  ['L_NEAR_LMIN', 'L is less than twice lmin: short-channel effects are not modelled'],
  ['SOURCE_BODY_FORWARD_BIASED', 'the source–body junction is forward-biased'],
  ['DEPLETION_CONDUCTS_AT_VGS0', 'the device is depletion-mode (VT < 0): it conducts at VGS = 0, so it has no off current'],
  ['TEMPERATURE_OUTSIDE_PROCESS_RANGE', "the temperature is outside the process's range"],
];

/** The points of a series without an answer, by error code; their columns are NaN. */
export class Failures {
  /** 1 at the index of every point without an answer. */
  readonly flags: Uint8Array;
  private readonly byCode = new Map<string, { count: number; message: string }>();
  private any = false;
  /** How many points have no answer. */
  count = 0;

  constructor(count: number) {
    this.flags = new Uint8Array(count);
  }

  add(index: number, error: unknown): void {
    if (!isEngineError(error)) throw error;
    if (this.flags[index]) return;
    this.flags[index] = 1;
    this.any = true;
    this.count++;
    const seen = this.byCode.get(error.code);
    if (seen) seen.count++;
    else this.byCode.set(error.code, { count: 1, message: error.message });
  }

  has(index: number): boolean {
    return this.flags[index] === 1;
  }

  blank(column: Float64Array): void {
    if (!this.any) return;
    for (let i = 0; i < column.length; i++) if (this.flags[i]) column[i] = Number.NaN;
  }

  warnings(param: SweepParam): Warning[] {
    const total = this.flags.length;
    return [...this.byCode].map(([code, { count, message }]) => ({
      code: 'POINTS_WITHOUT_ANSWER' as const,
      message: `${count} of ${total} points of this ${param} sweep have no answer (${code}), e.g.: ${message}`,
    }));
  }
}
