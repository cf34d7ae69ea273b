import type { AuditEvent } from '@channelwright/shared/schemas';
import { Badge, Code, Table, Text } from '@mantine/core';
import { formatDateTime } from '../../../lib/format-date';

function Change({ event }: { event: AuditEvent }) {
  if (event.before === null && event.after === null) return <Text span size="xs" c="dimmed">—</Text>;
  return (
    <details>
      <summary style={{ cursor: 'pointer', fontSize: 'var(--mantine-font-size-xs)' }}>before / after</summary>
      {event.before !== null && <Code block fz="xs">before: {JSON.stringify(event.before, null, 1)}</Code>}
      {event.after !== null && <Code block fz="xs">after: {JSON.stringify(event.after, null, 1)}</Code>}
    </details>
  );
}

/** The audit trail, newest first: when, who, what happened, and the state before and after. */
export function AuditTable({ events }: { events: AuditEvent[] }) {
  return (
    <Table aria-label="Audit trail" striped fz="sm" verticalSpacing={4}>
      <Table.Thead>
        <Table.Tr>
          <Table.Th>When</Table.Th>
          <Table.Th>Who</Table.Th>
          <Table.Th>Action</Table.Th>
          <Table.Th>What</Table.Th>
          <Table.Th>Change</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {events.map((event) => (
          <Table.Tr key={event.id}>
            <Table.Td style={{ whiteSpace: 'nowrap' }}>{formatDateTime(event.at)}</Table.Td>
            <Table.Td>{event.actor?.displayName ?? 'system'}</Table.Td>
            <Table.Td>
              <Badge variant="outline" color="gray" radius="sm" tt="none">{event.action}</Badge>
            </Table.Td>
            <Table.Td>{event.summary}</Table.Td>
            <Table.Td maw={360}>
              <Change event={event} />
            </Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}
