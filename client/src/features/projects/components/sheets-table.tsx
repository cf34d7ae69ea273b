import type { SheetSummary } from '@channelwright/shared/schemas';
import { Badge, Group, Table, Text } from '@mantine/core';
import { DayText } from '../../../components/day-text';
import { LinkedTitle } from '../../../components/linked-title';

/** The project's sheets: process version, defaults, device count and whether results are stale. */
export function SheetsTable({ sheets }: { sheets: SheetSummary[] }) {
  return (
    <Table.ScrollContainer minWidth={720}>
      <Table aria-label="Sheets" highlightOnHover verticalSpacing="xs" fz="sm">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Sheet</Table.Th>
            <Table.Th>Process</Table.Th>
            <Table.Th>Defaults</Table.Th>
            <Table.Th ta="right">Devices</Table.Th>
            <Table.Th>Results</Table.Th>
            <Table.Th>Changed</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {sheets.map((sheet) => (
            <Table.Tr key={sheet.id}>
              <Table.Td>
                <LinkedTitle to={`/sheets/${sheet.id}`} title={sheet.name} description={sheet.description} />
              </Table.Td>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>
                <Group gap={4} wrap="nowrap">
                  <Text size="sm">
                    {sheet.process.name} v{sheet.process.version}
                  </Text>
                  {sheet.process.latestVersion > sheet.process.version && (
                    <Badge size="xs" variant="outline" color="oxide" radius="sm" tt="none">
                      v{sheet.process.latestVersion} out
                    </Badge>
                  )}
                </Group>
              </Table.Td>
              <Table.Td>
                <Text size="xs" c="dimmed" style={{ whiteSpace: 'nowrap' }}>
                  {sheet.corner} · {sheet.temperature ?? sheet.process.tnom} °C · {sheet.model}
                </Text>
              </Table.Td>
              <Table.Td ta="right" style={{ fontVariantNumeric: 'tabular-nums' }}>
                {sheet.deviceCount}
              </Table.Td>
              <Table.Td>
                {sheet.stale ? (
                  <Badge size="sm" variant="light" color="oxide" radius="sm" tt="none">
                    {sheet.staleCount} stale
                  </Badge>
                ) : (
                  <Text size="xs" c="dimmed">
                    current
                  </Text>
                )}
              </Table.Td>
              <Table.Td>
                <DayText iso={sheet.updatedAt} />
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
