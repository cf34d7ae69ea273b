import type { DesignChart } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { SimpleGrid } from '@mantine/core';
import { curvesAgainstGmId, pointOfRow, type ChartPoint, type CurveFigure } from '../../model/gm-id-curves';
import { ChartFrame } from '../chart/chart-frame';
import { SweepChart, type AxisSpec } from '../chart/sweep-chart';
import { VtLengthChart } from './vt-length-chart';

interface Panel {
  figure: CurveFigure;
  title: string;
  y: AxisSpec;
  note?: string;
}

const PANELS: Panel[] = [
  { figure: 'idW', title: 'Current density ID/W against gm/ID', y: { symbol: 'ID/W', unit: 'A/m', log: true }, note: '1 A/m = 1 µA/µm' },
  { figure: 'gain', title: 'Intrinsic gain gm/gds against gm/ID', y: { symbol: 'gm/gds', unit: 'V/V', log: true } },
  { figure: 'ft', title: 'Transit frequency fT against gm/ID', y: { symbol: 'fT', unit: 'Hz', log: true }, note: 'fT = gm/(2π·Cgg)' },
  { figure: 'vdsat', title: 'VDSsat against gm/ID', y: { symbol: 'VDSsat', unit: 'V' } },
];

const GM_ID_AXIS: AxisSpec = { symbol: 'gm/ID', unit: '1/V' };

interface GmIdChartsProps {
  chart: DesignChart | undefined;
  loading: boolean;
  error: unknown;
  /** The gm/ID read at: a dashed line on every chart. */
  marker?: number;
  /** The chosen length: marked on VT against L. */
  chosenL?: number;
  /** Clicking a point of a gm/ID chart picks its length and gm/ID. */
  onPickPoint?: (point: ChartPoint) => void;
}

/** The four gm/ID design charts of one device, one line per characterised length, and VT against L. */
export function GmIdCharts({ chart, loading, error, marker, chosenL, onPickPoint }: GmIdChartsProps) {
  const held = chart
    ? `${chart.corner}, ${chart.temperature} °C, ${chart.polarity === 'pmos' ? 'VSD' : 'VDS'} = ${formatQuantity(chart.vds, 'V', { digits: 3 })}, ${chart.polarity === 'pmos' ? 'VBS' : 'VSB'} = ${formatQuantity(chart.vsb, 'V', { digits: 3 })}`
    : '';
  return (
    <SimpleGrid cols={{ base: 1, lg: 2 }} spacing="xs" verticalSpacing="xs">
      {PANELS.map((panel) => {
        const data = chart ? curvesAgainstGmId(chart.curves, panel.figure, Boolean(panel.y.log)) : { rows: [], series: [] };
        return (
          <ChartFrame
            key={panel.figure}
            title={panel.title}
            caption={[held, panel.note].filter(Boolean).join(' · ')}
            fileName={`${panel.figure}-vs-gm-id`}
            legend={data.series}
            loading={loading && !chart}
            error={error}
          >
            <SweepChart
              data={data}
              x={GM_ID_AXIS}
              y={panel.y}
              sparse
              height={260}
              marker={marker === undefined ? undefined : { x: marker, label: 'read here' }}
              onPickX={
                onPickPoint && chart
                  ? (_, row) => {
                      const point = pointOfRow(chart.curves, row);
                      if (point) onPickPoint(point);
                    }
                  : undefined
              }
              pickHint={onPickPoint ? 'Click to take this length and gm/ID into a device' : undefined}
            />
          </ChartFrame>
        );
      })}
      <VtLengthChart chart={chart} held={held} loading={loading} error={error} chosenL={chosenL} />
    </SimpleGrid>
  );
}
