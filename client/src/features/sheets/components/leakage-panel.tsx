import { Alert, Badge, Group, Paper, Skeleton, Stack, Table, Text } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck } from '@tabler/icons-react';
import { Quantity } from '../../../components/quantity';
import { RegionErrorBoundary } from '../../../components/region-error-boundary';
import { useSheetLeakage } from '../api/sheet-leakage';
import { LeakageChart } from './leakage-chart';
import { SkippedDevices } from './skipped-devices';

/** The leakage budget: the worst corner's total against the budget, the chart over temperature, and each device's terms. */
export function LeakagePanel({ sheetId }: { sheetId: string }) {
  const leakage = useSheetLeakage(sheetId);
  if (leakage.isPending) return <Skeleton height={240} aria-label="Loading the leakage" />;
  if (leakage.isError) return <Alert color="red" variant="light" title="The leakage could not be computed" role="alert">{leakage.error.message}</Alert>;
  const data = leakage.data;
  const at = data.temperatures.indexOf(data.budgetTemperature);
  // Nothing sized yet (tables still being characterised …): say why, rather than a total of 0 A and an empty chart.
  if (data.devices.length === 0 && data.conducting.length === 0) return <SkippedDevices skipped={data.skipped} nothingChecked what="the leakage budget" />;
  return (
    <Stack gap="sm">
      <Group gap="sm" wrap="wrap">
        {data.budget ? (
          <Badge size="lg" radius="sm" tt="none" variant="light" color={data.withinBudget ? 'green' : 'red'} leftSection={data.withinBudget ? <IconCircleCheck size={14} /> : <IconAlertTriangle size={14} />}>
            {data.withinBudget ? 'Within budget' : 'Over budget'}: <Quantity value={data.worst.total} unit="A" /> at {data.worst.corner}, {data.budgetTemperature} °C (budget <Quantity value={data.budget.current} unit="A" />)
          </Badge>
        ) : (
          <Text size="sm">
            Worst corner at {data.budgetTemperature} °C: {data.worst.corner}, <Quantity value={data.worst.total} unit="A" />. Set a budget in the sheet&apos;s settings to check it.
          </Text>
        )}
      </Group>
      <Paper withBorder radius="sm" p="sm">
        <RegionErrorBoundary region="the leakage chart">
          <LeakageChart leakage={data} />
        </RegionErrorBoundary>
      </Paper>
      <Paper withBorder radius="sm" p={0}>
        <Table.ScrollContainer minWidth={720}>
          <Table aria-label="Leakage per device" fz="xs" verticalSpacing={4} horizontalSpacing={8} striped>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Device</Table.Th>
                <Table.Th ta="right">Subthreshold</Table.Th>
                <Table.Th ta="right">Gate</Table.Th>
                <Table.Th ta="right">Junction</Table.Th>
                <Table.Th ta="right">GIDL</Table.Th>
                <Table.Th ta="right">Total, {data.fastCorner} {data.budgetTemperature} °C</Table.Th>
                <Table.Th ta="right">Worst corner</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {data.devices.map((device) => {
                const terms = at >= 0 ? device.atFastCorner[at] : null;
                const worst = device.atBudget.reduce<{ corner: string; total: number | null }>((a, b) => ((b.total ?? -1) > (a.total ?? -1) ? b : a), { corner: '—', total: null });
                return (
                  <Table.Tr key={device.deviceId}>
                    <Table.Th scope="row">{device.name}{device.multiplier > 1 ? ` ×${device.multiplier}` : ''}</Table.Th>
                    <Table.Td ta="right"><Quantity value={terms?.subthreshold} unit="A" /></Table.Td>
                    <Table.Td ta="right"><Quantity value={terms?.gate} unit="A" /></Table.Td>
                    <Table.Td ta="right"><Quantity value={terms?.junction} unit="A" /></Table.Td>
                    <Table.Td ta="right"><Quantity value={terms?.gidl} unit="A" nullText="not modelled" /></Table.Td>
                    <Table.Td ta="right"><Quantity value={terms?.total} unit="A" /></Table.Td>
                    <Table.Td ta="right">{worst.corner} <Quantity value={worst.total} unit="A" /></Table.Td>
                  </Table.Tr>
                );
              })}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      </Paper>
      {data.conducting.length > 0 && (
        <Text size="xs">
          Listed apart, not leakage: {data.conducting.map((d) => d.name).join(', ')} — depletion-mode, {data.conducting.length === 1 ? 'it conducts' : 'they conduct'} at VGS = 0 by design (
          {data.conducting.map((d) => <Quantity key={d.deviceId} value={d.current} unit="A" />)} at {data.fastCorner}, hottest).
        </Text>
      )}
      <SkippedDevices skipped={data.skipped} nothingChecked={false} what="the total" />
    </Stack>
  );
}
