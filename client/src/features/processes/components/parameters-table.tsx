import { DEVICE_PARAMETERS, type DeviceParams } from '@channelwright/shared/schemas';
import { Table, Text, Tooltip } from '@mantine/core';
import { displayQuantity } from '../utils/display-quantity';

export interface ParameterColumn {
  label: string;
  params: DeviceParams;
}

const valueOf = (params: DeviceParams, name: string): number | undefined => (params as Partial<Record<string, number>>)[name];

/** Device parameters side by side (NMOS | PMOS, or one flavour), each value in its display unit. */
export function ParametersTable({ columns, caption }: { columns: ParameterColumn[]; caption: string }) {
  const rows = DEVICE_PARAMETERS.filter((info) => columns.some((c) => valueOf(c.params, info.name) !== undefined)).map((info) => (
    <Table.Tr key={info.name}>
      <Table.Th scope="row" fw={500}>
        <Tooltip label={info.description} multiline w={320} withArrow>
          <Text span size="sm">
            {info.symbol}{' '}
            <Text span size="xs" c="dimmed" ff="monospace">
              {info.name}
            </Text>
          </Text>
        </Tooltip>
      </Table.Th>
      {columns.map((column) => {
        const value = valueOf(column.params, info.name);
        return (
          <Table.Td key={column.label} ff="monospace" ta="right">
            {value === undefined ? '—' : displayQuantity(value, info)}
          </Table.Td>
        );
      })}
    </Table.Tr>
  ));
  return (
    <Table.ScrollContainer minWidth={420}>
      <Table striped withTableBorder aria-label={caption} verticalSpacing={6}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Parameter</Table.Th>
            {columns.map((c) => (
              <Table.Th key={c.label} ta="right">
                {c.label}
              </Table.Th>
            ))}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>{rows}</Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
