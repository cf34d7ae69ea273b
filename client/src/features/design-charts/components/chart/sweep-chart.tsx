import { useMemo } from 'react';
import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceDot,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { ChartData, ChartRow } from '../../model/chart-series';
import { makeReadout } from './chart-readout';
import classes from './sweep-chart.module.css';
import { linearAxisFor, linearTicks } from '../../model/linear-ticks';
import { logAxisFor } from '../../../../lib/charts/log-axis';
import { formatTick } from '../../model/tick-format';

export interface AxisSpec {
  /** The quantity, e.g. "VOV"; the axis reads "VOV (V)". */
  symbol: string;
  unit: string;
  log?: boolean;
}

export interface ChartMarker {
  x: number;
  y?: number;
  label?: string;
}

interface SweepChartProps {
  data: ChartData;
  x: AxisSpec;
  y: AxisSpec;
  /** The chosen operating point: a dot (with y) or a dashed vertical line (without). */
  marker?: ChartMarker;
  /** Further vertical lines, e.g. the zero-temperature-coefficient VGS. */
  guides?: ChartMarker[];
  /** Clicking the plot picks the x value under the pointer (and the row it belongs to). */
  onPickX?: (x: number, row: ChartRow) => void;
  pickHint?: string;
  height?: number;
  /** Rows hold one series' point each (series with x values of their own): join each series over its own points. */
  sparse?: boolean;
}

const GRID = 'var(--mantine-color-default-border)';
const INK = 'var(--mantine-color-dimmed)';
const MARKER = '#c0392b';

/** Room for the legend: a row of about six entries per 20 px, so many series do not run into the plot. */
const legendHeight = (series: number) => 4 + 20 * Math.max(1, Math.ceil(series / 6));

const axisLabel = ({ symbol, unit }: AxisSpec) => (unit ? `${symbol} (${unit})` : symbol);

/** A line chart of swept series, with units on its axes, decades on its log axes and the chosen point marked. */
export function SweepChart({ data, x, y, marker, guides = [], onPickX, pickHint, height = 220, sparse = false }: SweepChartProps) {
  const yAxis = useMemo(() => {
    const values = data.rows.flatMap((row) => data.series.map((s) => row[s.key]));
    return y.log ? logAxisFor(values) : linearAxisFor(values);
  }, [data, y.log]);
  const xLog = useMemo(() => (x.log ? logAxisFor(data.rows.map((row) => row.x)) : null), [data, x.log]);
  const Readout = useMemo(() => makeReadout({ xSymbol: x.symbol, xUnit: x.unit, yUnit: y.unit, hint: pickHint }), [x, y.unit, pickHint]);
  const xs = data.rows.map((row) => row.x);
  const xDomain: [number, number] | undefined = xLog?.domain ?? (xs.length ? [Math.min(...xs), Math.max(...xs)] : undefined);
  const xTicks = xLog?.ticks ?? (xDomain ? linearTicks(xDomain[0], xDomain[1]) : undefined);

  return (
    <ResponsiveContainer width="100%" height={height} initialDimension={{ width: 480, height }} className={classes.plot}>
      <LineChart
        data={data.rows}
        margin={{ top: 8, right: 16, bottom: 28, left: 8 }}
        onClick={(state) => {
          const index = Number(state.activeTooltipIndex ?? state.activeIndex);
          const row = Number.isInteger(index) ? data.rows[index] : undefined;
          if (onPickX && row) onPickX(row.x, row);
        }}
        style={onPickX ? { cursor: 'crosshair' } : undefined}
      >
        <CartesianGrid stroke={GRID} strokeDasharray="2 3" />
        <XAxis
          dataKey="x"
          type="number"
          scale={xLog ? 'log' : 'linear'}
          domain={xDomain ?? ['dataMin', 'dataMax']}
          ticks={xTicks}
          allowDataOverflow
          tickFormatter={(value: number) => formatTick(value, x.unit)}
          tick={{ fontSize: 11, fill: INK }}
          stroke={INK}
          label={{ value: axisLabel(x), position: 'insideBottom', offset: -16, fontSize: 12, fill: INK }}
        />
        <YAxis
          type="number"
          scale={y.log && yAxis ? 'log' : 'linear'}
          domain={yAxis?.domain ?? ['auto', 'auto']}
          ticks={yAxis?.ticks}
          allowDataOverflow={Boolean(yAxis)}
          tickFormatter={(value: number) => formatTick(value, y.unit)}
          tick={{ fontSize: 11, fill: INK }}
          stroke={INK}
          width={56}
          label={{ value: axisLabel(y), angle: -90, position: 'insideLeft', offset: 4, fontSize: 12, fill: INK, style: { textAnchor: 'middle' } }}
        />
        <Tooltip content={Readout} isAnimationActive={false} />
        <Legend verticalAlign="top" height={legendHeight(data.series.length)} iconType="plainline" itemSorter={null} wrapperStyle={{ fontSize: 11 }} />
        {data.series.map((s) => (
          <Line
            key={s.key}
            dataKey={s.key}
            name={s.label}
            stroke={s.color}
            strokeWidth={1.6}
            strokeDasharray={s.dashed ? '5 3' : undefined}
            dot={false}
            activeDot={{ r: 3 }}
            isAnimationActive={false}
            connectNulls={sparse}
          />
        ))}
        {guides.map((guide) => (
          <ReferenceLine key={`guide-${guide.x}`} x={guide.x} stroke={INK} strokeDasharray="4 4" label={{ value: guide.label, position: 'insideTopRight', fontSize: 11, fill: INK }} />
        ))}
        {marker && marker.y === undefined && (
          <ReferenceLine x={marker.x} stroke={MARKER} strokeDasharray="3 3" label={{ value: marker.label, position: 'insideTopLeft', fontSize: 11, fill: MARKER }} />
        )}
        {marker && marker.y !== undefined && (
          <ReferenceDot x={marker.x} y={marker.y} r={4} fill={MARKER} stroke="#ffffff" label={{ value: marker.label, position: 'right', fontSize: 11, fill: MARKER }} />
        )}
      </LineChart>
    </ResponsiveContainer>
  );
}
