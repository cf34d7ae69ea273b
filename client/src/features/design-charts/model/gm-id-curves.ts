import type { DesignChartCurve } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { colorAt, type ChartData, type ChartRow } from './chart-series';

/** The figures of a design-chart curve that are drawn against gm/ID. */
export type CurveFigure = 'idW' | 'gain' | 'ft' | 'vdsat';

export const lengthLabel = (l: number): string => `L = ${formatQuantity(l, 'm', { digits: 3 })}`;

/**
 * One series per length against gm/ID. Each length has its own gm/ID values, so a row holds one curve's point and
 * leaves the others empty (the chart joins each series over its own points). With `positiveOnly` (a log axis)
 * zero and negative values become gaps.
 */
export function curvesAgainstGmId(curves: DesignChartCurve[], figure: CurveFigure, positiveOnly: boolean): ChartData {
  const series = curves.map((curve, index) => ({ key: `l${index}`, label: lengthLabel(curve.l), color: colorAt(index) }));
  const rows: ChartRow[] = [];
  curves.forEach((curve, index) => {
    curve.gmId.forEach((x, i) => {
      const y = curve[figure][i];
      if (!Number.isFinite(x) || !Number.isFinite(y) || (positiveOnly && !(y > 0))) return;
      rows.push({ x, [`l${index}`]: y } as ChartRow);
    });
  });
  rows.sort((a, b) => a.x - b.x);
  return { rows, series };
}

/** Where a design point sits on the charts: a characterised length and a gm/ID. */
export interface ChartPoint {
  l: number;
  gmId: number;
}

/** The length and gm/ID of a row of `curvesAgainstGmId` (each row holds one curve's point); null for an empty row. */
export function pointOfRow(curves: DesignChartCurve[], row: ChartRow): ChartPoint | null {
  const index = curves.findIndex((_, i) => typeof row[`l${i}`] === 'number');
  return index < 0 ? null : { l: curves[index].l, gmId: row.x };
}

/** A curve's figures at one gm/ID, interpolated linearly between its two nearest points; null outside the curve. */
export function readAtGmId(curve: DesignChartCurve, gmId: number): Record<CurveFigure | 'vgs', number> | null {
  // On the strong-inversion side gm/ID falls from point to point (the schema's promise).
  for (let i = 0; i + 1 < curve.gmId.length; i += 1) {
    const high = curve.gmId[i];
    const low = curve.gmId[i + 1];
    if (gmId <= high && gmId >= low) {
      const t = high === low ? 0 : (high - gmId) / (high - low);
      const at = (values: number[]) => values[i] + t * (values[i + 1] - values[i]);
      return { vgs: at(curve.vgs), idW: at(curve.idW), gain: at(curve.gain), ft: at(curve.ft), vdsat: at(curve.vdsat) };
    }
  }
  return null;
}

