import type { SizeRequestInput, SizeResponse } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { SimpleGrid, Text } from '@mantine/core';
import { ChartFrame } from '../chart/chart-frame';
import { bodyEffectSweep, temperatureSweep, ztcSweep, type ProcessSpan, type SeriesChoice } from '../../model/chart-requests';
import { mergeSweeps } from '../../model/chart-series';
import { SweepChart } from '../chart/sweep-chart';
import { useSweep } from '../../api/compute-sweep';

interface TemperatureChartsProps {
  request: SizeRequestInput;
  result: SizeResponse;
  span: ProcessSpan;
  choice: SeriesChoice;
}

const EMPTY = { rows: [], series: [] };

function ztcSentence(result: SizeResponse, vgsSymbol: string): string {
  if (result.ztcVgs === null) return 'This device has no zero-temperature-coefficient point below the supply.';
  const side = result.vgs < result.ztcVgs ? 'below it ID rises with temperature' : 'above it ID falls with temperature';
  return `Zero-temperature-coefficient point at ${vgsSymbol} = ${formatQuantity(result.ztcVgs, 'V')}; this device sits at ${formatQuantity(result.vgs, 'V')}, and ${side}.`;
}

/** How the sized device moves with temperature and with body bias. */
export function TemperatureCharts({ request, result, span, choice }: TemperatureChartsProps) {
  const thermal = useSweep(temperatureSweep(request, span, choice));
  const ztc = useSweep(ztcSweep(request, result, span));
  const body = useSweep(bodyEffectSweep(request, span, choice));
  const pmos = request.polarity === 'pmos';
  const vgsSymbol = pmos ? 'VSG' : 'VGS';

  const currents = thermal.data
    ? mergeSweeps(
        [
          { response: thermal.data, field: 'id', prefix: 'ID' },
          { response: thermal.data, field: 'ioff', prefix: 'Ioff', dashed: true },
        ],
        true,
      )
    : EMPTY;
  const crossing = ztc.data ? mergeSweeps([{ response: ztc.data, field: 'id' }]) : EMPTY;
  const threshold = body.data ? mergeSweeps([{ response: body.data, field: 'vt' }]) : EMPTY;

  return (
    <SimpleGrid cols={{ base: 1, lg: 2 }} spacing="xs" verticalSpacing="xs">
      <ChartFrame
        title="ID and off current against temperature"
        caption={`W = ${formatQuantity(result.w, 'm')} and ${vgsSymbol} = ${formatQuantity(result.vgs, 'V')} held; Ioff at VGS = 0, VDS = VDD`}
        fileName="current-vs-temperature"
        legend={currents.series}
        loading={thermal.isPending}
        error={thermal.error}
      >
        <SweepChart data={currents} x={{ symbol: 'T', unit: '°C' }} y={{ symbol: 'current', unit: 'A', log: true }} marker={{ x: result.temperature, label: 'chosen' }} />
      </ChartFrame>
      <ChartFrame
        title={`ID against ${vgsSymbol} at three temperatures`}
        caption={`W = ${formatQuantity(result.w, 'm')} held; the curves cross at the zero-temperature-coefficient point`}
        fileName="ztc-point"
        legend={crossing.series}
        loading={ztc.isPending}
        error={ztc.error}
        readout={
          <Text size="xs" aria-label="Zero-temperature-coefficient point">
            {ztcSentence(result, vgsSymbol)}
          </Text>
        }
      >
        <SweepChart
          data={crossing}
          x={{ symbol: vgsSymbol, unit: 'V' }}
          y={{ symbol: 'ID', unit: 'A' }}
          marker={{ x: result.vgs, y: result.id, label: 'chosen' }}
          guides={result.ztcVgs === null ? [] : [{ x: result.ztcVgs, label: 'zero TC' }]}
        />
      </ChartFrame>
      <ChartFrame
        title={`VT against ${pmos ? 'VBS' : 'VSB'}`}
        caption="The body effect: VT = VT0 + γ(√(2φF + VSB) − √(2φF))"
        fileName="vt-vs-vsb"
        legend={threshold.series}
        loading={body.isPending}
        error={body.error}
      >
        <SweepChart
          data={threshold}
          x={{ symbol: pmos ? 'VBS' : 'VSB', unit: 'V' }}
          y={{ symbol: pmos ? 'VT (−VTP)' : 'VT', unit: 'V' }}
          marker={{ x: result.vsb, y: result.vt, label: 'chosen' }}
        />
      </ChartFrame>
    </SimpleGrid>
  );
}
