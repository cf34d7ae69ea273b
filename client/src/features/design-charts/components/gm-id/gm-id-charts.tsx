import type { DesignChart } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { SimpleGrid } from '@mantine/core';
import { curvesAgainstGmId, type CurveFigure } from '../../model/gm-id-curves';
import { ChartFrame } from '../chart/chart-frame';
import { SweepChart, type AxisSpec } from '../chart/sweep-chart';

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

/** The four gm/ID design charts of one device, one line per characterised length. */
export function GmIdCharts({ chart, loading, error, marker }: { chart: DesignChart | undefined; loading: boolean; error: unknown; marker?: number }) {
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
            <SweepChart data={data} x={GM_ID_AXIS} y={panel.y} sparse height={260} marker={marker === undefined ? undefined : { x: marker, label: 'read here' }} />
          </ChartFrame>
        );
      })}
    </SimpleGrid>
  );
}
