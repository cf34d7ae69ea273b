import type { ExtractionCurves } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { Group, Select, SimpleGrid, Stack, Text } from '@mantine/core';
import { useMemo, useState } from 'react';
import { CartesianGrid, ComposedChart, Legend, Line, ReferenceLine, ResponsiveContainer, Scatter, Tooltip, XAxis, YAxis, ZAxis } from 'recharts';

type Curve = ExtractionCurves['curves'][number];

interface Row {
  vgs: number;
  /** Measured current of a point the fit used, A. */
  used: number | null;
  /** Measured current of a point left out, A. */
  left: number | null;
  fit: number | null;
  /** modelled/measured − 1, in percent. */
  residual: number | null;
}

const GRID = 'var(--mantine-color-default-border)';
const INK = 'var(--mantine-color-dimmed)';
const MEASURED = '#1c7ed6';
const LEFT_OUT = '#adb5bd';
const FIT = '#e8590c';

/** How a curve is named in the picker: its bias, temperature and geometry. */
export function curveLabel(curve: Curve): string {
  const q = (value: number, unit: string) => formatQuantity(value, unit, { digits: 3 });
  return `VDS ${q(curve.vds, 'V')}, VSB ${q(curve.vsb, 'V')}, ${q(curve.temperature, '°C')}, W/L ${q(curve.w, 'm')} / ${q(curve.l, 'm')}`;
}

function rowsOf(curve: Curve): Row[] {
  return curve.points.map((p) => ({
    vgs: p.vgs,
    used: p.excluded === null ? p.id : null,
    left: p.excluded === null ? null : p.id,
    fit: p.modelled,
    residual: p.residual === null ? null : p.residual * 100,
  }));
}

/** The log axis shows at most this many decades below the largest current (a simulator's floor would squash the rest). */
const LOG_DECADES = 9;
/** Dot area of the measured points, px² (small enough that the fitted line shows between them). */
const DOT_AREA = 14;

/** Decades spanning the positive values (at most LOG_DECADES of them), for a log axis. */
function decades(values: number[]): { domain: [number, number]; ticks: number[] } | null {
  const positive = values.filter((v) => v > 0);
  if (positive.length === 0) return null;
  const high = Math.ceil(Math.log10(Math.max(...positive)));
  const low = Math.max(Math.floor(Math.log10(Math.min(...positive))), high - LOG_DECADES);
  const ticks = Array.from({ length: high - low + 1 }, (_, k) => 10 ** (low + k));
  return { domain: [10 ** low, 10 ** high], ticks };
}

const tickOf = (unit: string) => (value: number) => formatQuantity(value, unit, { digits: 3 });

function CurrentChart({ rows, log, title }: { rows: Row[]; log: boolean; title: string }) {
  const axis = useMemo(() => (log ? decades(rows.flatMap((r) => [r.used ?? 0, r.left ?? 0, r.fit ?? 0])) : null), [rows, log]);
  // A log axis cannot show zero or negative currents: those points are left off that chart only.
  const shown = log ? rows.map((r) => ({ ...r, used: r.used !== null && r.used > 0 ? r.used : null, left: r.left !== null && r.left > 0 ? r.left : null, fit: r.fit !== null && r.fit > 0 ? r.fit : null })) : rows;
  return (
    <figure aria-label={title} style={{ margin: 0 }}>
      <Text size="sm" fw={500} component="figcaption">
        {title}
      </Text>
      <ResponsiveContainer width="100%" height={260} initialDimension={{ width: 420, height: 260 }}>
        <ComposedChart data={shown} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={GRID} strokeDasharray="2 3" />
          <XAxis dataKey="vgs" type="number" domain={['dataMin', 'dataMax']} tickFormatter={tickOf('V')} tick={{ fontSize: 11, fill: INK }} stroke={INK} label={{ value: 'VGS (V)', position: 'insideBottom', offset: -12, fontSize: 12, fill: INK }} />
          <YAxis
            type="number"
            scale={axis ? 'log' : 'linear'}
            domain={axis?.domain ?? [0, 'auto']}
            ticks={axis?.ticks}
            allowDataOverflow={Boolean(axis)}
            tickFormatter={tickOf('A')}
            tick={{ fontSize: 11, fill: INK }}
            stroke={INK}
            width={64}
          />
          <Tooltip formatter={(value) => (typeof value === 'number' ? formatQuantity(value, 'A', { digits: 4 }) : String(value))} labelFormatter={(vgs) => `VGS ${formatQuantity(Number(vgs), 'V', { digits: 4 })}`} isAnimationActive={false} />
          <ZAxis range={[DOT_AREA, DOT_AREA]} />
          <Legend verticalAlign="top" height={22} wrapperStyle={{ fontSize: 11 }} />
          <Scatter name="Measured" dataKey="used" fill={MEASURED} fillOpacity={0.55} shape="circle" isAnimationActive={false} />
          <Scatter name="Left out" dataKey="left" fill={LEFT_OUT} fillOpacity={0.7} shape="circle" isAnimationActive={false} />
          <Line name="Fitted model" dataKey="fit" stroke={FIT} strokeWidth={2} dot={false} connectNulls={false} isAnimationActive={false} />
        </ComposedChart>
      </ResponsiveContainer>
    </figure>
  );
}

function ResidualChart({ rows }: { rows: Row[] }) {
  return (
    <figure aria-label="Residuals of the fit" style={{ margin: 0 }}>
      <Text size="sm" fw={500} component="figcaption">
        Residuals: fitted / measured − 1
      </Text>
      <ResponsiveContainer width="100%" height={180} initialDimension={{ width: 860, height: 180 }}>
        <ComposedChart data={rows} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={GRID} strokeDasharray="2 3" />
          <XAxis dataKey="vgs" type="number" domain={['dataMin', 'dataMax']} tickFormatter={tickOf('V')} tick={{ fontSize: 11, fill: INK }} stroke={INK} label={{ value: 'VGS (V)', position: 'insideBottom', offset: -12, fontSize: 12, fill: INK }} />
          <YAxis type="number" tickFormatter={(v: number) => `${Number(v.toPrecision(2))} %`} tick={{ fontSize: 11, fill: INK }} stroke={INK} width={72} />
          <ZAxis range={[DOT_AREA, DOT_AREA]} />
          <ReferenceLine y={0} stroke={INK} />
          <Tooltip formatter={(value) => (typeof value === 'number' ? `${value.toPrecision(3)} %` : String(value))} labelFormatter={(vgs) => `VGS ${formatQuantity(Number(vgs), 'V', { digits: 4 })}`} isAnimationActive={false} />
          <Scatter name="Residual" dataKey="residual" fill={FIT} shape="circle" isAnimationActive={false} />
        </ComposedChart>
      </ResponsiveContainer>
    </figure>
  );
}

/** Data against fit for one curve at a time: ID on linear and log axes, and the residuals. */
export function FitCharts({ curves }: { curves: Curve[] }) {
  const [chosen, setChosen] = useState('0');
  const curve = curves[Number(chosen)] ?? curves[0];
  const rows = useMemo(() => (curve ? rowsOf(curve) : []), [curve]);
  if (!curve) return <Text size="sm">No curves to show.</Text>;
  return (
    <Stack gap="sm">
      <Group>
        <Select
          label="Curve"
          data={curves.map((c, k) => ({ value: String(k), label: curveLabel(c) }))}
          value={chosen}
          onChange={(value) => setChosen(value ?? '0')}
          allowDeselect={false}
          w={460}
          searchable
        />
        <Text size="sm" c="dimmed" mt="lg">
          {curves.length} curves in the file
        </Text>
      </Group>
      <SimpleGrid cols={{ base: 1, md: 2 }}>
        <CurrentChart rows={rows} log={false} title="ID against VGS, linear axis" />
        <CurrentChart rows={rows} log title="ID against VGS, log axis" />
      </SimpleGrid>
      <ResidualChart rows={rows} />
    </Stack>
  );
}
