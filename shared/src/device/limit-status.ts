import type { DeviceLimit, LimitStatus } from '../schemas/sheet-corners.js';

/** A value inside its limit by less than this fraction of the limit's scale is "tight". */
export const TIGHT_FRACTION = 0.1;

/**
 * The margin of a value to a designer's limit, as a fraction of the limit's scale (half the span between a
 * minimum and a maximum, else the size of the one bound, else 1 in the figure's unit): negative outside,
 * 0 on the bound. −∞ for a value that is missing (no answer at that point).
 */
export function limitMargin(value: number | null, limit: DeviceLimit): number {
  if (value === null || !Number.isFinite(value)) return Number.NEGATIVE_INFINITY;
  const { min, max } = limit;
  const scale = min !== undefined && max !== undefined ? (max - min) / 2 || 1 : Math.abs(min ?? max ?? 0) || 1;
  const margins = [...(min === undefined ? [] : [value - min]), ...(max === undefined ? [] : [max - value])];
  return Math.min(...margins) / scale;
}

/** fail (outside the limit, or no value), tight (inside by less than TIGHT_FRACTION of its scale), ok; none without a limit. */
export function limitStatus(value: number | null, limit: DeviceLimit | undefined): LimitStatus {
  if (!limit) return 'none';
  const margin = limitMargin(value, limit);
  if (margin < 0) return 'fail';
  return margin < TIGHT_FRACTION ? 'tight' : 'ok';
}
