import type { TableGridResponse } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { Table, Text } from '@mantine/core';
import type { ReactNode } from 'react';

export interface GridRow {
  key: string;
  label: string;
  model: string;
  grid: TableGridResponse;
  points: number;
  /** A last cell, e.g. "in use" for the table the model sizes from. */
  note?: ReactNode;
}

const list = (values: number[], unit: string) => values.map((v) => formatQuantity(v, unit, { digits: 3 })).join(', ');

function vgsAxis({ start, step, count }: TableGridResponse['vgs']): string {
  const end = start + step * (count - 1);
  return `${formatQuantity(start, 'V', { digits: 3 })} … ${formatQuantity(end, 'V', { digits: 3 })} in ${formatQuantity(step, 'V', { digits: 3 })} steps (${count})`;
}

/** The grid of each device: what was (or will be) simulated, axis by axis, and how many points that makes. */
export function GridTable({ rows, caption, noteHeader }: { rows: GridRow[]; caption: string; noteHeader?: string }) {
  return (
    <Table.ScrollContainer minWidth={760}>
      <Table aria-label={caption} withTableBorder verticalSpacing={4} fz="xs">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Device</Table.Th>
            <Table.Th>Lengths</Table.Th>
            <Table.Th>VGS</Table.Th>
            <Table.Th>VDS</Table.Th>
            <Table.Th>VSB</Table.Th>
            <Table.Th>Corners</Table.Th>
            <Table.Th>Temperatures</Table.Th>
            <Table.Th ta="right">Points</Table.Th>
            {noteHeader !== undefined && <Table.Th>{noteHeader}</Table.Th>}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {rows.map((row) => (
            <Table.Tr key={row.key}>
              <Table.Td>
                <Text size="xs" fw={600}>
                  {row.label}
                </Text>
                <Text size="xs" c="dimmed" ff="monospace">
                  {row.model}
                </Text>
              </Table.Td>
              <Table.Td>{list(row.grid.lengths, 'm')}</Table.Td>
              <Table.Td>{vgsAxis(row.grid.vgs)}</Table.Td>
              <Table.Td>{list(row.grid.vds, 'V')}</Table.Td>
              <Table.Td>{list(row.grid.vsb, 'V')}</Table.Td>
              <Table.Td>{row.grid.corners.join(', ')}</Table.Td>
              <Table.Td>{row.grid.temperatures.map((t) => `${t} °C`).join(', ')}</Table.Td>
              <Table.Td ta="right" style={{ fontVariantNumeric: 'tabular-nums' }}>
                {row.points.toLocaleString('en')}
              </Table.Td>
              {noteHeader !== undefined && <Table.Td>{row.note}</Table.Td>}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
