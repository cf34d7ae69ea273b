import type { SweepPoint, SweepResponse } from '@channelwright/shared/schemas';

/** One line of a chart: its key in the rows, its legend text, and how it is drawn. */
export interface ChartSeries {
  key: string;
  label: string;
  color: string;
  dashed?: boolean;
}

/** One x value with the y of every series at it (null where that point has no answer). */
export type ChartRow = { x: number } & Record<string, number | null>;

export interface ChartData {
  rows: ChartRow[];
  series: ChartSeries[];
}

/** Our own line colours, mid tones that read on the light and the dark scheme: petrol, copper, slate, olive, plum, teal, ochre, grey. */
export const SERIES_COLORS = ['#2b91a7', '#c9782e', '#6b7ba6', '#7f9a44', '#a4608f', '#3aa3a0', '#c9a227', '#7d8590'];

export const colorAt = (index: number): string => SERIES_COLORS[index % SERIES_COLORS.length];

/** "TT, 27 °C"; a temperature sweep's series are named by their corner alone. */
export function seriesName(series: { corner: string; temperature: number | null }): string {
  return series.temperature === null ? series.corner : `${series.corner}, ${series.temperature} °C`;
}

interface SweepSource {
  response: SweepResponse;
  /** Read from each point, e.g. "wOverL". */
  field: keyof SweepPoint;
  /** Put before every series name, e.g. "square law". */
  prefix?: string;
  dashed?: boolean;
}

/**
 * Lays the series of one or more sweeps over the same x values (they share the sweep spec) into rows,
 * one series per corner × temperature × source, each in its own colour; a source may be dashed.
 * With `positiveOnly` (a log axis) zero and negative values become gaps.
 */
export function mergeSweeps(sources: SweepSource[], positiveOnly = false): ChartData {
  const rows: ChartRow[] = [];
  const series: ChartSeries[] = [];
  for (const source of sources) {
    const param = source.response.param as keyof SweepPoint;
    source.response.series.forEach((one) => {
      const name = seriesName(one);
      const key = `${source.prefix ?? ''}${name}`;
      series.push({ key, label: source.prefix ? `${source.prefix}: ${name}` : name, color: colorAt(series.length), dashed: source.dashed });
      one.points.forEach((point, i) => {
        const x = point[param] as number;
        const row = (rows[i] ??= { x } as ChartRow);
        const y = point[source.field];
        row[key] = typeof y === 'number' && Number.isFinite(y) && (!positiveOnly || y > 0) ? y : null;
      });
    });
  }
  return { rows, series };
}
