import { EngineError } from './errors.js';
import { say } from './say.js';

/** Fingers wider than this are split unless the request says otherwise, m. */
export const DEFAULT_MAX_FINGER_WIDTH = 10e-6;

export interface SnappedWidth {
  /** Total drawn width = fingers × fingerWidth, m. */
  w: number;
  fingers: number;
  /** Width of one finger, a multiple of wgrid, ≥ wmin and ≤ maxFingerWidth, m. */
  fingerWidth: number;
  /** True when the finger had to be widened to wmin. */
  raisedToWmin: boolean;
}

/**
 * Splits a width into the fewest fingers no wider than maxFingerWidth, snaps each finger to the nearest
 * multiple of wgrid (never above maxFingerWidth) and raises it to wmin when it falls below.
 * The total then differs from the width asked by at most fingers·wgrid/2 (unless raised).
 */
export function snapWidth(w: number, wgrid: number, wmin: number, maxFingerWidth: number): SnappedWidth {
  if (maxFingerWidth < wmin) {
    throw new EngineError('FINGER_WIDTH_BELOW_WMIN', `The finger-width limit ${say(maxFingerWidth, 'm')} is below wmin = ${say(wmin, 'm')}`, 'maxFingerWidth');
  }
  const fingers = Math.max(1, Math.ceil(w / maxFingerWidth - 1e-9));
  const maxSteps = Math.floor(maxFingerWidth / wgrid + 1e-9);
  const minSteps = Math.ceil(wmin / wgrid - 1e-9);
  let steps = Math.min(Math.round(w / fingers / wgrid), maxSteps);
  const raisedToWmin = steps < minSteps;
  if (raisedToWmin) steps = minSteps;
  const fingerWidth = onGrid(steps * wgrid);
  return { w: onGrid(fingers * fingerWidth), fingers, fingerWidth, raisedToWmin };
}

/** Drops the last bits of binary noise from a product of grid steps (1.2300000000000002e-6 → 1.23e-6). */
function onGrid(value: number): number {
  return Number(value.toPrecision(12));
}
