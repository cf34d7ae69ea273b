import { describe, expect, it } from 'vitest';
import { linearAxisFor, linearTicks } from './linear-ticks';
import { logAxisFor } from '../../../lib/charts/log-axis';
import { formatTick } from './tick-format';

describe('chart axes', () => {
  it('write ticks in engineering notation and leave the unit to the axis label', () => {
    expect(formatTick(1e-6, 'A')).toBe('1 µ');
    expect(formatTick(2.5e9, 'Hz')).toBe('2.5 G');
    expect(formatTick(-0.15, 'V')).toBe('-150 m');
  });

  it('write ratios plainly, whole thousands included', () => {
    expect(formatTick(1000, '')).toBe('1000');
    expect(formatTick(10000, '')).toBe('10000');
    expect(formatTick(2.5e5, '')).toBe('2.5e5');
    expect(formatTick(0.1, '')).toBe('0.1');
    expect(formatTick(16, '1/V')).toBe('16');
    expect(formatTick(1200, 'V/V')).toBe('1200');
    expect(formatTick(-40, '°C')).toBe('-40');
  });

  it('put linear ticks 1, 2 or 5 × 10ⁿ apart inside the range', () => {
    expect(linearTicks(-0.15, 0.6)).toEqual([-0.1, 0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6]);
    expect(linearTicks(0, 1.8)).toEqual([0, 0.5, 1, 1.5]);
    expect(linearTicks(-40, 125)).toEqual([-40, -20, 0, 20, 40, 60, 80, 100, 120]);
    expect(linearTicks(1, 1)).toEqual([]);
  });

  it('give a log axis whole decades around the data, ignoring zero and negative values', () => {
    expect(logAxisFor([3e-12, 0, -1, null, 2e-5])).toEqual({ domain: [1e-12, 1e-4], ticks: [1e-12, 1e-11, 1e-10, 1e-9, 1e-8, 1e-7, 1e-6, 1e-5, 1e-4] });
    expect(logAxisFor([5, 5])).toEqual({ domain: [1, 10], ticks: [1, 10] });
    expect(logAxisFor([10, 10])).toEqual({ domain: [1, 100], ticks: [1, 10, 100] });
    expect(logAxisFor([1e-15, 1e-3])?.ticks).toEqual([1e-15, 1e-13, 1e-11, 1e-9, 1e-7, 1e-5, 1e-3]);
    expect(logAxisFor([0, null])).toBeNull();
  });
});

describe('a linear value axis', () => {
  it('widens the data range to whole ticks', () => {
    expect(linearAxisFor([0, 1.23e-3])).toEqual({ domain: [0, 1.4e-3], ticks: [0, 2e-4, 4e-4, 6e-4, 8e-4, 1e-3, 1.2e-3, 1.4e-3] });
    expect(linearAxisFor([0.45, 0.76, null])).toEqual({ domain: [0.45, 0.8], ticks: [0.45, 0.5, 0.55, 0.6, 0.65, 0.7, 0.75, 0.8] });
    expect(linearAxisFor([])).toBeNull();
  });
});
