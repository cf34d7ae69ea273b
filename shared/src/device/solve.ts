import { betaOf, channelOf, slopeFactorOf, thresholdOf } from './channel.js';
import { type CurrentModel, drainCurrent } from './drain-current.js';
import { EngineError } from './errors.js';
import { type OperatingPoint, operatingPoint } from './operating-point.js';
import { overdriveForCurrent, overdriveForGmId } from './overdrive.js';
import { type PreparedDevice } from './resolve-device.js';
import { say, voltageNames } from './say.js';
import type { ChannelTerms } from './short-channel.js';
import { DEFAULT_MAX_FINGER_WIDTH, type SnappedWidth, snapWidth } from './snap-width.js';
import type { Warning } from '../schemas/warning.js';
import { sizePlausibilityWarnings } from './size-plausibility.js';
import { operatingPointWarnings } from './warnings.js';

/** Widths above this are refused as no circuit's, m (10 cm). */
export const MAX_WIDTH = 0.1;

/** What to size for: ID, L, VDS, VSB (SI, polarity-normalised) and exactly one of vov, gmId, w, vgs. */
export interface SizeTarget {
  id: number;
  l: number;
  vds: number;
  vsb: number;
  vov?: number;
  gmId?: number;
  w?: number;
  vgs?: number;
  /** Fingers are split so that none is wider, m; default 10 µm. */
  maxFingerWidth?: number;
}

export type Constraint = 'vov' | 'gmId' | 'w' | 'vgs';

export interface Sizing extends OperatingPoint {
  fingers: number;
  fingerWidth: number;
  /** The width the target asked for before snapping, m. */
  wRequired: number;
  constraint: Constraint;
  warnings: Warning[];
}

/** Which one of vov, gmId, w, vgs the target gives (the schemas make sure it is exactly one). */
export function constraintOf(target: Pick<SizeTarget, Constraint>): Constraint {
  const given = (['vov', 'gmId', 'w', 'vgs'] as const).filter((name) => target[name] !== undefined);
  if (given.length !== 1) {
    throw new EngineError('VALIDATION_FAILED', `Give exactly one of vov, gmId, w, vgs (got ${given.join(', ') || 'none'})`, given[1] ?? 'vov');
  }
  return given[0];
}

export function checkLength(device: PreparedDevice, l: number, field = 'l'): void {
  if (l < device.params.lmin) {
    throw new EngineError('L_BELOW_LMIN', `L = ${say(l, 'm')} is below the process minimum ${say(device.params.lmin, 'm')}`, field);
  }
}

/** The gate overdrive a vov, gmId or vgs constraint asks for (not w), V; vt is the threshold at this VDS (DIBL included). */
export function overdriveOfConstraint(model: CurrentModel, constraint: Exclude<Constraint, 'w'>, value: number, vt: number, n: number, ut: number, vds: number, terms?: ChannelTerms): number {
  if (constraint === 'vov') return value;
  if (constraint === 'vgs') return value - vt;
  return overdriveForGmId(model, n, ut, vds, value, terms);
}

/**
 * The drawn width for an effective width the current needs: every finger loses ΔW, so the drawn width
 * is Weff + fingers·ΔW, snapped; the finger count settles within a few rounds.
 */
function drawnWidthFor(weff: number, dw: number, params: { wgrid: number; wmin: number }, maxFingerWidth: number): { snapped: SnappedWidth; wRequired: number } {
  let fingers = 1;
  for (let round = 0; round < 4; round++) {
    const wRequired = weff + fingers * dw;
    const snapped = snapWidth(wRequired, params.wgrid, params.wmin, maxFingerWidth);
    if (snapped.fingers === fingers || dw === 0) return { snapped, wRequired };
    fingers = snapped.fingers;
  }
  const wRequired = weff + fingers * dw;
  return { snapped: snapWidth(wRequired, params.wgrid, params.wmin, maxFingerWidth), wRequired };
}

/**
 * Sizes a device: the width for the target (unsnapped), then the drawn width (fingers no wider than the
 * limit, each snapped to wgrid and at least wmin), then the operating point actually reached with that
 * width. For vov and gmId targets VGS is re-solved so that ID stays at the target; for a vgs target VGS
 * is kept and the reached ID is reported; for a w target VGS is solved for ID and must stay ≤ vdd.
 */
export function solveSize(device: PreparedDevice, model: CurrentModel, target: SizeTarget): Sizing {
  const { params, ut } = device;
  const { id, l, vds, vsb } = target;
  const constraint = constraintOf(target);
  checkLength(device, l);
  // The channel per metre of effective width (no finger has lost ΔW yet): kp(L, T)/Leff, λ, the short-channel terms.
  const perWidth = channelOf(device, model, 1, l, 0);
  const { lambda, terms } = perWidth;
  const vt = thresholdOf(device, perWidth, vsb, vds);
  const n = slopeFactorOf(device, perWidth, vsb);
  const maxFingerWidth = target.maxFingerWidth ?? DEFAULT_MAX_FINGER_WIDTH;
  const dw = model === 'square-law' ? 0 : (params.dw ?? 0);

  let drawn: { snapped: SnappedWidth; wRequired: number };
  if (constraint === 'w') {
    const w = target.w as number;
    if (w < params.wmin) throw new EngineError('W_BELOW_WMIN', `W = ${say(w, 'm')} is below the process minimum ${say(params.wmin, 'm')}`, 'w');
    if (!(w <= MAX_WIDTH)) throw new EngineError('W_TOO_LARGE', `W = ${say(w, 'm')} is more than ${say(MAX_WIDTH, 'm')}`, 'w');
    drawn = { snapped: snapWidth(w, params.wgrid, params.wmin, maxFingerWidth), wRequired: w };
  } else {
    const vov = overdriveOfConstraint(model, constraint, target[constraint] as number, vt, n, ut, vds, terms);
    const weff = id / drainCurrent(model, betaOf(perWidth, vsb), n, ut, lambda, vov, vds, terms);
    if (!(weff <= MAX_WIDTH)) {
      throw new EngineError('W_TOO_LARGE', `This target needs W = ${say(weff, 'm')}, more than ${say(MAX_WIDTH, 'm')}; raise the overdrive or lower gm/ID`, constraint);
    }
    drawn = drawnWidthFor(weff, dw, params, maxFingerWidth);
  }
  const { snapped, wRequired } = drawn;
  const beta = betaOf(channelOf(device, model, snapped.w, l, snapped.fingers), vsb);

  let vgs: number;
  if (constraint === 'vgs') {
    vgs = target.vgs as number;
  } else {
    vgs = vt + overdriveForCurrent(model, beta, n, ut, lambda, vds, id, terms);
    if (constraint === 'w' && vgs > device.vdd) {
      const most = drainCurrent(model, beta, n, ut, lambda, device.vdd - vt, vds, terms);
      throw new EngineError(
        'ID_NOT_REACHABLE_BELOW_VDD',
        `W = ${say(snapped.w, 'm')} cannot carry ${say(id, 'A')} with ${voltageNames(device.polarity).vgs} ≤ VDD = ${say(device.vdd, 'V')}: it would need ${voltageNames(device.polarity).vgs} = ${say(vgs, 'V')}; at VDD it carries ${say(most, 'A')}`,
        'id',
      );
    }
  }

  const op = operatingPoint(device, model, snapped.w, l, { vgs, vds, vsb }, snapped.fingers);
  const warnings = operatingPointWarnings(device, model, op);
  if (snapped.raisedToWmin) {
    warnings.push({
      code: 'W_BELOW_WMIN',
      message: `The width needed, ${say(wRequired / snapped.fingers, 'm')} per finger, is below wmin = ${say(params.wmin, 'm')}: the finger was widened to wmin${constraint === 'vgs' ? ', so ID is above the target' : ' and VGS lowered to keep ID'}; a longer L brings W back above wmin.`,
    });
  }
  warnings.push(...sizePlausibilityWarnings({ w: snapped.w, l, fingers: snapped.fingers, id: op.id }));
  return { ...op, fingers: snapped.fingers, fingerWidth: snapped.fingerWidth, wRequired, constraint, warnings };
}
