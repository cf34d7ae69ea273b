import { cornerNames, type Process, type SizeRequestInput, type SizeResponse } from '@channelwright/shared/schemas';
import { Group, Paper, Stack, Tabs, Text } from '@mantine/core';
import { useEffect, useState } from 'react';
import { processSpanOf, type SeriesChoice } from '../model/chart-requests';
import { SeriesPicker } from './chart/series-picker';
import { OverdriveCharts } from './families/overdrive-charts';
import { TemperatureCharts } from './families/temperature-charts';
import { TransferCharts } from './families/transfer-charts';

export interface DesignChartsPanelProps {
  /** The request that produced `result`; the charts sweep around it. */
  request: SizeRequestInput;
  result: SizeResponse;
  /** The process it was sized in: its corners, supply and temperature range bound the sweeps. */
  process: Process;
  /** Takes a VOV clicked on a chart into the targets; absent when they are read only. */
  onPickVov?: (vov: number) => void;
}

/** The sized device's design charts, one family per tab; only the open tab computes. */
export function DesignChartsPanel({ request, result, process, onPickVov }: DesignChartsPanelProps) {
  const corners = cornerNames(process);
  const span = processSpanOf(process);
  const [choice, setChoice] = useState<SeriesChoice>({ corners: [result.corner], temperatures: [result.temperature] });
  // A new corner or temperature in the form becomes the charts' first series.
  useEffect(() => {
    setChoice((current) => ({
      corners: current.corners.includes(result.corner) ? current.corners : [result.corner, ...current.corners.slice(1)],
      temperatures: current.temperatures.includes(result.temperature) ? current.temperatures : [result.temperature, ...current.temperatures.slice(1)],
    }));
  }, [result.corner, result.temperature]);
  const props = { request, result, span, choice };

  return (
    <Paper withBorder radius="sm" p="sm" component="section" aria-label="Charts">
      <Tabs defaultValue="overdrive" keepMounted={false} variant="outline">
        <Group justify="space-between" align="flex-end" mb="xs" wrap="wrap">
          <Tabs.List>
            <Tabs.Tab value="overdrive">W/L against VOV</Tabs.Tab>
            <Tabs.Tab value="transfer">ID against VGS</Tabs.Tab>
            <Tabs.Tab value="temperature">Temperature and body effect</Tabs.Tab>
          </Tabs.List>
          <SeriesPicker corners={corners} span={span} value={choice} onChange={setChoice} />
        </Group>
        <Tabs.Panel value="overdrive">
          <Stack gap={4}>
            {onPickVov && (
              <Text size="xs" c="dimmed">
                Click a point on any of these charts to take its VOV into the targets.
              </Text>
            )}
            <OverdriveCharts {...props} onPickVov={onPickVov} />
          </Stack>
        </Tabs.Panel>
        <Tabs.Panel value="transfer">
          <TransferCharts {...props} />
        </Tabs.Panel>
        <Tabs.Panel value="temperature">
          <TemperatureCharts {...props} />
        </Tabs.Panel>
      </Tabs>
    </Paper>
  );
}
