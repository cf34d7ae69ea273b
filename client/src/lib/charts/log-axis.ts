/** Domain and ticks of a logarithmic axis: whole decades around the data, one tick a decade (every other one past eight). */
export interface LogAxis {
  domain: [number, number];
  ticks: number[];
}

export function logAxisFor(values: Iterable<number | null | undefined>): LogAxis | null {
  let min = Infinity;
  let max = -Infinity;
  for (const value of values) {
    if (typeof value !== 'number' || !(value > 0) || !Number.isFinite(value)) continue;
    min = Math.min(min, value);
    max = Math.max(max, value);
  }
  if (min === Infinity) return null;
  let low = Math.floor(Math.log10(min));
  let high = Math.ceil(Math.log10(max));
  if (high === low) {
    low -= 1;
    high += 1;
  }
  const step = high - low > 8 ? 2 : 1;
  const ticks: number[] = [];
  for (let exponent = low; exponent <= high; exponent += step) ticks.push(Number(`1e${exponent}`));
  return { domain: [Number(`1e${low}`), Number(`1e${high}`)], ticks };
}
