import type { SizeRequestInput, SizeResponse } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { Badge, Group, SimpleGrid } from '@mantine/core';
import { ChartFrame } from '../chart/chart-frame';
import { transferSweep, type ProcessSpan, type SeriesChoice } from '../../model/chart-requests';
import { mergeSweeps } from '../../model/chart-series';
import { subthresholdSlope } from '../../model/subthreshold-slope';
import { SweepChart } from '../chart/sweep-chart';
import { useSweep } from '../../api/compute-sweep';

interface TransferChartsProps {
  request: SizeRequestInput;
  result: SizeResponse;
  span: ProcessSpan;
  choice: SeriesChoice;
}

/** ID against VGS at the sized W/L, square law (dashed) beside the all-region model, on linear and log axes. */
export function TransferCharts({ request, result, span, choice }: TransferChartsProps) {
  const allRegion = useSweep(transferSweep(request, result, span, choice, 'all-region'));
  const squareLaw = useSweep(transferSweep(request, result, span, choice, 'square-law'));
  const loading = allRegion.isPending || squareLaw.isPending;
  const error = allRegion.error ?? squareLaw.error;
  const sources = (positiveOnly: boolean) =>
    allRegion.data && squareLaw.data
      ? mergeSweeps(
          [
            { response: allRegion.data, field: 'id', prefix: 'all-region' },
            { response: squareLaw.data, field: 'id', prefix: 'square law', dashed: true },
          ],
          positiveOnly,
        )
      : { rows: [], series: [] };
  const linear = sources(false);
  const log = sources(true);
  const first = allRegion.data?.series[0];
  const slope = first ? subthresholdSlope(first.points.map((p) => ({ vgs: p.vgs as number, id: p.id ?? null }))) : null;
  const caption = `W/L = ${formatQuantity(result.wOverL, '', { digits: 4 })} (W = ${formatQuantity(result.w, 'm')}, L = ${formatQuantity(result.l, 'm')}) held; VDS = ${formatQuantity(result.vds, 'V')}`;
  const marker = { x: result.vgs, y: result.id, label: 'chosen' };
  const x = { symbol: request.polarity === 'pmos' ? 'VSG' : 'VGS', unit: 'V' };

  return (
    <SimpleGrid cols={{ base: 1, lg: 2 }} spacing="xs" verticalSpacing="xs">
      <ChartFrame title="ID against VGS, linear" caption={caption} fileName="id-vs-vgs-linear" legend={linear.series} loading={loading} error={error}>
        <SweepChart data={linear} x={x} y={{ symbol: 'ID', unit: 'A' }} marker={marker} height={260} />
      </ChartFrame>
      <ChartFrame
        title="ID against VGS, logarithmic"
        caption={caption}
        fileName="id-vs-vgs-log"
        legend={log.series}
        loading={loading}
        error={error}
        readout={
          slope !== null && (
            <Group gap={6}>
              <Badge variant="light" color="channel" radius="sm" tt="none" aria-label="Subthreshold slope">
                subthreshold slope {slope.toFixed(1)} mV/decade
              </Badge>
            </Group>
          )
        }
      >
        <SweepChart data={log} x={x} y={{ symbol: 'ID', unit: 'A', log: true }} marker={marker} height={260} />
      </ChartFrame>
    </SimpleGrid>
  );
}
