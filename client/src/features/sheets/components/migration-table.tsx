import type { MigrationFigures, SheetMigration } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { Table, Text } from '@mantine/core';
import { Fragment } from 'react';

type Key = keyof MigrationFigures;

const FIGURES: Array<{ key: Key; label: string; unit: string; delta: 'relative' | 'absolute' }> = [
  { key: 'w', label: 'W', unit: 'm', delta: 'relative' },
  { key: 'l', label: 'L', unit: 'm', delta: 'relative' },
  { key: 'area', label: 'Area', unit: 'm²', delta: 'relative' },
  { key: 'vgs', label: 'VGS', unit: 'V', delta: 'absolute' },
  { key: 'gmId', label: 'gm/ID', unit: '/V', delta: 'absolute' },
  { key: 'intrinsicGain', label: 'gm/gds', unit: '', delta: 'relative' },
  { key: 'ft', label: 'fT', unit: 'Hz', delta: 'relative' },
  { key: 'ioff', label: 'Ioff', unit: 'A', delta: 'relative' },
];

function value(figure: (typeof FIGURES)[number], v: number | null | undefined): string {
  if (v === null || v === undefined) return '—';
  if (figure.key === 'area') return `${formatQuantity(v * 1e12, '', { digits: 3 })} µm²`;
  if (figure.unit === '/V') return `${v.toFixed(2)} /V`;
  return formatQuantity(v, figure.unit, { digits: 3 });
}

function delta(figure: (typeof FIGURES)[number], from: number | null | undefined, to: number | null | undefined): string {
  if (from === null || from === undefined || to === null || to === undefined) return '';
  if (figure.delta === 'relative') return from === 0 ? '' : `${to >= from ? '+' : ''}${(((to - from) / from) * 100).toFixed(0)} %`;
  const d = to - from;
  return figure.unit === 'V' ? `${d >= 0 ? '+' : ''}${formatQuantity(d, 'V', { digits: 3 })}` : `${d >= 0 ? '+' : ''}${d.toFixed(2)}`;
}

/** Old and new figures of every device side by side, with the change. */
export function MigrationTable({ migration }: { migration: SheetMigration }) {
  return (
    <Table.ScrollContainer minWidth={1000}>
      <Table aria-label="Migration deltas" fz="xs" verticalSpacing={3} horizontalSpacing={6} striped>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Device</Table.Th>
            {FIGURES.map((f) => (
              <Table.Th key={f.key} ta="right" colSpan={1}>{f.label}: {migration.from.processName} → {migration.to.processName} (Δ)</Table.Th>
            ))}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {migration.devices.map((device) => (
            <Fragment key={device.sourceDeviceId}>
              <Table.Tr data-device={device.name}>
                <Table.Th scope="row">{device.name}</Table.Th>
                {FIGURES.map((f) => (
                  <Table.Td key={f.key} ta="right" style={{ whiteSpace: 'nowrap' }} aria-label={`${device.name} ${f.label}`}>
                    {value(f, device.old?.[f.key])} → {value(f, device.new?.[f.key])}
                    <Text span size="xs" c="dimmed" ml={4}>{delta(f, device.old?.[f.key], device.new?.[f.key])}</Text>
                  </Table.Td>
                ))}
              </Table.Tr>
              {(device.notes.length > 0 || device.error) && (
                <Table.Tr>
                  <Table.Td />
                  <Table.Td colSpan={FIGURES.length}>
                    <Text size="xs" c={device.error ? 'red' : 'dimmed'}>{[...device.notes, ...(device.error ? [`Not sized on ${migration.to.processName}: ${device.error.message}`] : [])].join(' · ')}</Text>
                  </Table.Td>
                </Table.Tr>
              )}
            </Fragment>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
