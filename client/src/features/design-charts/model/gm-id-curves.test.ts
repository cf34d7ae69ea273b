import { describe, expect, it } from 'vitest';
import { NMOS_CHART } from '../../../test/fake-characterisation';
import { curvesAgainstGmId, pointOfRow, readAtGmId } from './gm-id-curves';

const [short] = NMOS_CHART.curves;

describe('gm/ID curves', () => {
  it('read a figure at a gm/ID between two points by linear interpolation', () => {
    // Between gm/ID 20 (ID/W 1, gain 30) and 10 (ID/W 10, gain 20), 15 lies half way: 5.5 and 25.
    const at = readAtGmId(short, 15);
    expect(at?.idW).toBeCloseTo(5.5, 12);
    expect(at?.gain).toBeCloseTo(25, 12);
    expect(at?.ft).toBeCloseTo(6e9, 0);
    expect(at?.vdsat).toBeCloseTo(0.15, 12);
    expect(at?.vgs).toBeCloseTo(0.45, 12);
  });

  it('read the point itself at a characterised gm/ID, and nothing beyond the curve', () => {
    expect(readAtGmId(short, 10)?.idW).toBe(10);
    expect(readAtGmId(short, 25)).toBeNull();
    expect(readAtGmId(short, 4)).toBeNull();
  });

  it('lay one series per length over rows sorted by gm/ID, each row holding one curve point', () => {
    const data = curvesAgainstGmId(NMOS_CHART.curves, 'gain', false);
    expect(data.series.map((s) => s.label)).toEqual(['L = 180 nm', 'L = 1 µm']);
    expect(data.rows.map((row) => row.x)).toEqual([5, 6, 10, 12, 20, 22]);
    expect(data.rows[0]).toEqual({ x: 5, l0: 10 });
    expect(data.rows[1]).toEqual({ x: 6, l1: 40 });
  });

  it('leave out values a log axis cannot draw', () => {
    const curve = { ...short, idW: [0, 10, 40] };
    expect(curvesAgainstGmId([curve], 'idW', true).rows.map((row) => row.x)).toEqual([5, 10]);
  });

  it('name the length and gm/ID of a clicked row by the curve whose point it holds', () => {
    const data = curvesAgainstGmId(NMOS_CHART.curves, 'gain', false);
    expect(pointOfRow(NMOS_CHART.curves, data.rows[1])).toEqual({ l: 1e-6, gmId: 6 });
    expect(pointOfRow(NMOS_CHART.curves, data.rows[4])).toEqual({ l: 0.18e-6, gmId: 20 });
    expect(pointOfRow(NMOS_CHART.curves, { x: 7 } as never)).toBeNull();
  });
});
