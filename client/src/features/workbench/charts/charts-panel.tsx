import type { SizeRequestInput, SizeResponse } from '@channelwright/shared/schemas';
import { Group, Paper, Stack, Tabs, Text } from '@mantine/core';
import { useEffect, useState } from 'react';
import type { ProcessSpan, SeriesChoice } from './chart-requests';
import { OverdriveCharts } from './overdrive-charts';
import { SeriesPicker } from './series-picker';
import { TemperatureCharts } from './temperature-charts';
import { TransferCharts } from './transfer-charts';

interface ChartsPanelProps {
  /** The request that produced `result`; the charts sweep around it. */
  request: SizeRequestInput;
  result: SizeResponse;
  corners: string[];
  span: ProcessSpan;
  onPickVov?: (vov: number) => void;
}

/** The sized device's curves, one family per tab; only the open tab computes. */
export function ChartsPanel({ request, result, corners, span, onPickVov }: ChartsPanelProps) {
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
