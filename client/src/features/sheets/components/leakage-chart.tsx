import type { SheetLeakage } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { logAxisFor } from '../../../lib/charts/log-axis';

// Our own colours, readable on both schemes' paper: the theme's text colour for ink, a deep teal for the total.
const INK = 'var(--mantine-color-dimmed)';
const GRID = 'var(--mantine-color-default-border)';
const TOTAL = 'light-dark(#1f6f78, #6fc3cc)';
const BUDGET = 'light-dark(#a33b28, #f08a74)';

/** The range's ends and the round temperatures between them (multiples of 25 °C). */
function temperatureTicks(temperatures: number[]): number[] {
  const [low, high] = [temperatures[0], temperatures.at(-1) as number];
  const ticks = [low];
  for (let t = Math.ceil(low / 25) * 25; t < high; t += 25) if (t - low >= 10 && high - t >= 10) ticks.push(t);
  return [...ticks, high];
}

/** Total off-state leakage of the sheet against temperature at the fast corner, on a log axis, with the budget. */
export function LeakageChart({ leakage }: { leakage: SheetLeakage }) {
  const rows = leakage.temperatures.map((temperature, i) => ({ temperature, total: leakage.totals[i] > 0 ? leakage.totals[i] : null }));
  const axis = logAxisFor([...rows.map((r) => r.total), leakage.budget?.current ?? null]);
  return (
    <figure aria-label="Total leakage against temperature" style={{ margin: 0 }}>
      <ResponsiveContainer width="100%" height={260} initialDimension={{ width: 560, height: 260 }}>
        <LineChart data={rows} margin={{ top: 12, right: 24, bottom: 28, left: 8 }}>
          <CartesianGrid stroke={GRID} strokeDasharray="2 3" />
          <XAxis dataKey="temperature" type="number" domain={['dataMin', 'dataMax']} ticks={temperatureTicks(leakage.temperatures)} tick={{ fontSize: 11, fill: INK }} stroke={INK} label={{ value: 'Temperature (°C)', position: 'insideBottom', offset: -16, fontSize: 12, fill: INK }} />
          <YAxis
            type="number"
            scale={axis ? 'log' : 'linear'}
            domain={axis?.domain ?? ['auto', 'auto']}
            ticks={axis?.ticks}
            allowDataOverflow={Boolean(axis)}
            tickFormatter={(value: number) => formatQuantity(value, 'A', { digits: 2 })}
            tick={{ fontSize: 11, fill: INK }}
            stroke={INK}
            width={64}
            label={{ value: 'Total leakage (A, log)', angle: -90, position: 'insideLeft', offset: 4, fontSize: 12, fill: INK, style: { textAnchor: 'middle' } }}
          />
          <Tooltip formatter={(value) => formatQuantity(Number(value), 'A')} labelFormatter={(t) => `${String(t)} °C, ${leakage.fastCorner}`} isAnimationActive={false} />
          <Line dataKey="total" name={`Total at ${leakage.fastCorner}`} stroke={TOTAL} strokeWidth={2} dot={{ r: 2.5 }} isAnimationActive={false} />
          {leakage.budget && (
            <ReferenceLine y={leakage.budget.current} stroke={BUDGET} strokeDasharray="6 4" label={{ value: `budget ${formatQuantity(leakage.budget.current, 'A')}`, position: 'insideTopRight', fontSize: 11, fill: BUDGET }} />
          )}
          {leakage.budget && <ReferenceLine x={leakage.budget.temperature} stroke={BUDGET} strokeDasharray="2 4" />}
        </LineChart>
      </ResponsiveContainer>
      <figcaption style={{ fontSize: 'var(--mantine-font-size-xs)', color: 'var(--mantine-color-dimmed)' }}>
        Σ of VGS = 0, VDS = VDD off currents (subthreshold, gate, junction and GIDL where the engine gives it) at the fast corner {leakage.fastCorner}; the dashed line is the budget.
      </figcaption>
    </figure>
  );
}
