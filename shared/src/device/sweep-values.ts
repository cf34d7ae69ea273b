import type { SweepSpec } from '../schemas/sweep.js';

/** The swept values: `points` values from `from` to `to`, evenly spaced (lin) or in a constant ratio (log); one point is `from`. */
export function sweepValues(spec: Pick<SweepSpec, 'from' | 'to' | 'points' | 'scale'>): Float64Array {
  const values = new Float64Array(spec.points);
  const last = spec.points - 1;
  const inverseLast = 1 / last;
  for (let i = 0; i <= last; i++) {
    if (last === 0) values[i] = spec.from;
    else if (spec.scale === 'log') values[i] = spec.from * (spec.to / spec.from) ** (i / last);
    else values[i] = (spec.from * (last - i) + spec.to * i) * inverseLast;
  }
  if (last > 0 && spec.scale === 'log') values[last] = spec.to;
  return values;
}
