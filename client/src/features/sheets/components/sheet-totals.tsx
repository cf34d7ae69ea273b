import type { Device, SheetTotals as Totals } from '@channelwright/shared/schemas';
import { Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { Quantity } from '../../../components/quantity';
import { LabelledFigure } from '../../../components/labelled-figure';

const namesOf = (ids: string[], devices: Device[]) =>
  ids.map((id) => devices.find((d) => d.id === id)?.targets.name ?? id).join(', ');

/** The sheet's sums: supply current and power, gate area, worst-case leakage, warnings and matching. */
export function SheetTotals({ totals, devices }: { totals: Totals; devices: Device[] }) {
  const { leakage } = totals;
  return (
    <Paper withBorder radius="sm" p="sm" component="section" aria-label="Totals">
      <SimpleGrid cols={{ base: 2, sm: 3, lg: 6 }} spacing="md" verticalSpacing="sm">
        <LabelledFigure label="Supply current" hint="devices marked as supply branches">
          <Quantity value={totals.supplyCurrent} unit="A" />
        </LabelledFigure>
        <LabelledFigure label="Supply power" hint={`at VDD = ${totals.vdd} V`}>
          <Quantity value={totals.supplyPower} unit="W" />
        </LabelledFigure>
        <LabelledFigure label="Gate area" hint="Σ W·L·m">
          <Quantity value={totals.gateArea * 1e12} unit="µm²" digits={4} />
        </LabelledFigure>
        <LabelledFigure label={`Leakage, ${leakage.slowest.corner}`} hint={`at ${leakage.slowest.temperature} °C, slowest corner`}>
          <Quantity value={leakage.slowest.current} unit="A" />
        </LabelledFigure>
        <LabelledFigure label={`Leakage, ${leakage.fastest.corner}`} hint={`at ${leakage.fastest.temperature} °C, fastest corner`}>
          <Quantity value={leakage.fastest.current} unit="A" />
        </LabelledFigure>
        <LabelledFigure label="Devices with warnings" hint={totals.warningDeviceIds.length ? namesOf(totals.warningDeviceIds, devices) : undefined}>
          {totals.warningDeviceIds.length} of {devices.length}
        </LabelledFigure>
      </SimpleGrid>
      {(totals.matchGroups.length > 0 || leakage.conductingDeviceIds.length > 0 || totals.failedDeviceIds.length > 0) && (
        <Stack gap={2} mt="sm">
          {totals.matchGroups.map((group) => (
            <Text key={group.name} size="xs">
              Match group <b>{group.name}</b> ({namesOf(group.deviceIds, devices)}): σ(VOS) <Quantity value={group.sigmaVos} unit="V" />, σ(ΔVT){' '}
              <Quantity value={group.sigmaVt} unit="V" /> for the worst pair (Pelgrom)
            </Text>
          ))}
          {leakage.conductingDeviceIds.length > 0 && (
            <Text size="xs" c="dimmed">
              Left out of the leakage: {namesOf(leakage.conductingDeviceIds, devices)}, depletion-mode and conducting at VGS = 0.
            </Text>
          )}
          {totals.failedDeviceIds.length > 0 && (
            <Text size="xs" c="red">
              Not sized: {namesOf(totals.failedDeviceIds, devices)}.
            </Text>
          )}
        </Stack>
      )}
    </Paper>
  );
}
