import type { DesignChart } from '@channelwright/shared/schemas';
import { colorAt, type ChartData, type ChartRow } from './chart-series';

/** VT against L as one series, shortest length first; lengths that are not positive (no log axis point) are left out. */
export function vtAgainstLength(vt: DesignChart['vt']): ChartData {
  const rows: ChartRow[] = [];
  vt.l.forEach((l, i) => {
    const value = vt.vt[i];
    if (l > 0 && Number.isFinite(value)) rows.push({ x: l, vt: value } as ChartRow);
  });
  rows.sort((a, b) => a.x - b.x);
  return { rows, series: [{ key: 'vt', label: 'VT', color: colorAt(0) }] };
}
