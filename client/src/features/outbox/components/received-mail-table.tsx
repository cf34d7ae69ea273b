import type { ReceivedMail } from '@channelwright/shared/schemas';
import { Anchor, Table, Text } from '@mantine/core';
import { formatDateTime } from '../../../lib/format-date';

/** Received messages, newest first; opening one shows its parts. */
export function ReceivedMailTable({ mails, label, onOpen }: { mails: ReceivedMail[]; label: string; onOpen: (mail: ReceivedMail) => void }) {
  if (mails.length === 0) return <Text size="sm" c="dimmed" p="md">No messages.</Text>;
  return (
    <Table aria-label={label} striped highlightOnHover fz="sm" verticalSpacing={4}>
      <Table.Thead>
        <Table.Tr>
          <Table.Th>Received</Table.Th>
          <Table.Th>To</Table.Th>
          <Table.Th>Subject</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {mails.map((mail) => (
          <Table.Tr key={mail.id}>
            <Table.Td style={{ whiteSpace: 'nowrap' }}>{formatDateTime(mail.receivedAt)}</Table.Td>
            <Table.Td>{mail.to.join(', ')}</Table.Td>
            <Table.Td>
              <Anchor component="button" type="button" size="sm" onClick={() => onOpen(mail)}>
                {mail.subject || '(no subject)'}
              </Anchor>
            </Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}
