/** Tick values from `step`'s first multiple at or above min up to max. */
function ticksAt(min: number, max: number, step: number): number[] {
  const ticks: number[] = [];
  for (let k = Math.ceil(min / step - 1e-9); k * step <= max + step * 1e-9; k++) ticks.push(Number((k * step).toPrecision(12)) || 0);
  return ticks;
}

/**
 * Round tick values 1, 2 or 5 × 10ⁿ apart covering [min, max]: the spacing whose number of ticks is
 * nearest to `count` (the denser one on a tie).
 */
export function linearTicks(min: number, max: number, count = 6): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max) || max <= min) return [];
  const power = 10 ** Math.floor(Math.log10((max - min) / count));
  const candidates = [1, 2, 5, 10, 20].map((m) => ticksAt(min, max, m * power));
  return candidates.reduce((best, ticks) => (Math.abs(ticks.length - count) < Math.abs(best.length - count) ? ticks : best));
}

/** A linear value axis: the data range widened to whole ticks, with those ticks (null without finite data). */
export function linearAxisFor(values: Iterable<number | null | undefined>, count = 6): { domain: [number, number]; ticks: number[] } | null {
  let min = Infinity;
  let max = -Infinity;
  for (const value of values) {
    if (typeof value !== 'number' || !Number.isFinite(value)) continue;
    min = Math.min(min, value);
    max = Math.max(max, value);
  }
  if (min === Infinity) return null;
  if (max === min) {
    const pad = Math.abs(min) * 0.1 || 1;
    min -= pad;
    max += pad;
  }
  const inner = linearTicks(min, max, count);
  const step = inner.length > 1 ? inner[1] - inner[0] : (max - min) / count;
  const low = Number((Math.floor(min / step + 1e-9) * step).toPrecision(12));
  const high = Number((Math.ceil(max / step - 1e-9) * step).toPrecision(12));
  return { domain: [low, high], ticks: ticksAt(low, high, step) };
}
