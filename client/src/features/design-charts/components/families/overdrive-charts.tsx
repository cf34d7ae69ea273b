import type { SizeRequestInput, SizeResponse, SweepPoint } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { SimpleGrid } from '@mantine/core';
import { ChartFrame } from '../chart/chart-frame';
import { overdriveSweep, type ProcessSpan, type SeriesChoice } from '../../model/chart-requests';
import { mergeSweeps } from '../../model/chart-series';
import { SweepChart, type AxisSpec } from '../chart/sweep-chart';
import { useSweep } from '../../api/compute-sweep';

interface OverdriveChartsProps {
  request: SizeRequestInput;
  result: SizeResponse;
  span: ProcessSpan;
  choice: SeriesChoice;
  /** Takes a VOV picked on a chart into the form. */
  onPickVov?: (vov: number) => void;
}

interface Panel {
  field: keyof SweepPoint & keyof SizeResponse;
  title: string;
  y: AxisSpec;
}

const PANELS: Panel[] = [
  { field: 'wOverL', title: 'W/L against VOV', y: { symbol: 'W/L', unit: '', log: true } },
  { field: 'gmId', title: 'gm/ID against VOV', y: { symbol: 'gm/ID', unit: '1/V' } },
  { field: 'ft', title: 'fT against VOV', y: { symbol: 'fT', unit: 'Hz', log: true } },
  { field: 'intrinsicGain', title: 'Intrinsic gain against VOV', y: { symbol: 'gm/gds', unit: 'V/V' } },
];

const VOV_AXIS: AxisSpec = { symbol: 'VOV', unit: 'V' };

/** The device re-sized at every overdrive for the same ID: what each choice of VOV costs and buys. */
export function OverdriveCharts({ request, result, span, choice, onPickVov }: OverdriveChartsProps) {
  const sweep = useSweep(overdriveSweep(request, result, span, choice));
  const caption = `ID = ${formatQuantity(request.id, 'A')} held, L = ${formatQuantity(request.l, 'm')}; the device re-sized at each VOV`;
  return (
    <SimpleGrid cols={{ base: 1, lg: 2 }} spacing="xs" verticalSpacing="xs">
      {PANELS.map((panel) => {
        const data = sweep.data ? mergeSweeps([{ response: sweep.data, field: panel.field }], panel.y.log) : { rows: [], series: [] };
        const chosen = result[panel.field];
        return (
          <ChartFrame
            key={panel.field}
            title={panel.title}
            caption={caption}
            fileName={`${panel.field}-vs-vov`}
            legend={data.series}
            loading={sweep.isPending}
            error={sweep.error}
          >
            <SweepChart
              data={data}
              x={VOV_AXIS}
              y={panel.y}
              marker={{ x: result.vov, y: typeof chosen === 'number' ? chosen : undefined, label: 'chosen' }}
              onPickX={onPickVov}
              pickHint={onPickVov ? 'Click to take this VOV' : undefined}
            />
          </ChartFrame>
        );
      })}
    </SimpleGrid>
  );
}
