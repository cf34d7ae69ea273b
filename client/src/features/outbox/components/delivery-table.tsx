import type { OutboxMessage } from '@channelwright/shared/schemas';
import { Badge, Table, Text } from '@mantine/core';
import { formatDateTime } from '../../../lib/format-date';

const STATE_COLOR = { queued: 'channel', sent: 'green', failed: 'red' } as const;

/** The outbox: each message with its delivery state, attempts and last error. */
export function DeliveryTable({ messages }: { messages: OutboxMessage[] }) {
  if (messages.length === 0) return <Text size="sm" c="dimmed" p="md">Nothing sent yet.</Text>;
  return (
    <Table aria-label="Deliveries" striped fz="sm" verticalSpacing={4}>
      <Table.Thead>
        <Table.Tr>
          <Table.Th>Written</Table.Th>
          <Table.Th>To</Table.Th>
          <Table.Th>Subject</Table.Th>
          <Table.Th>State</Table.Th>
          <Table.Th ta="right">Attempts</Table.Th>
          <Table.Th>Last error</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {messages.map((message) => (
          <Table.Tr key={message.id}>
            <Table.Td style={{ whiteSpace: 'nowrap' }}>{formatDateTime(message.createdAt)}</Table.Td>
            <Table.Td>{message.to}</Table.Td>
            <Table.Td>{message.subject}</Table.Td>
            <Table.Td>
              <Badge color={STATE_COLOR[message.state]} variant="light" tt="none">{message.state}</Badge>
            </Table.Td>
            <Table.Td ta="right">{message.attempts}</Table.Td>
            <Table.Td c="dimmed" maw={280}>{message.lastError ?? '—'}</Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}
