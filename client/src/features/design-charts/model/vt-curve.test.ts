import { describe, expect, it } from 'vitest';
import { NMOS_CHART } from '../../../test/fake-characterisation';
import { vtAgainstLength } from './vt-curve';

describe('VT against L', () => {
  it('lays the chart answer’s VT per length into one series, shortest length first', () => {
    const data = vtAgainstLength(NMOS_CHART.vt);
    expect(data.series.map((s) => s.label)).toEqual(['VT']);
    expect(data.rows).toEqual([
      { x: 0.18e-6, vt: 0.4 },
      { x: 1e-6, vt: 0.45 },
    ]);
  });

  it('sorts lengths and leaves out a length a log axis cannot show', () => {
    const data = vtAgainstLength({ l: [2e-6, 0, 0.5e-6], vt: [0.5, 0.3, 0.42] });
    expect(data.rows.map((row) => [row.x, row.vt])).toEqual([
      [0.5e-6, 0.42],
      [2e-6, 0.5],
    ]);
  });
});
