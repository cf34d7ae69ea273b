import type { DesignChart } from '@channelwright/shared/schemas';
import { useMemo } from 'react';
import { vtAgainstLength } from '../../model/vt-curve';
import { ChartFrame } from '../chart/chart-frame';
import { SweepChart, type AxisSpec } from '../chart/sweep-chart';

const L_AXIS: AxisSpec = { symbol: 'L', unit: 'm', log: true };
const VT_AXIS: AxisSpec = { symbol: 'VT', unit: 'V' };

/** The threshold voltage against length (log L) at the chart's corner, temperature and bias; the chosen length marked. */
export function VtLengthChart({ chart, held, loading, error, chosenL }: { chart: DesignChart | undefined; held: string; loading: boolean; error: unknown; chosenL?: number }) {
  const data = useMemo(() => (chart ? vtAgainstLength(chart.vt) : { rows: [], series: [] }), [chart]);
  const chosen = data.rows.find((row) => row.x === chosenL);
  return (
    <ChartFrame
      title="Threshold voltage VT against L"
      caption={[held, 'the simulator’s VT'].filter(Boolean).join(' · ')}
      fileName="vt-vs-l"
      legend={data.series}
      loading={loading && !chart}
      error={error}
    >
      <SweepChart data={data} x={L_AXIS} y={VT_AXIS} height={260} marker={chosen ? { x: chosen.x, y: chosen.vt ?? undefined, label: 'chosen L' } : undefined} />
    </ChartFrame>
  );
}
