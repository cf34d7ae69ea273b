import type { ReviewRequest } from '@channelwright/shared/schemas';
import { Anchor, Badge, Table, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { formatDay } from '../../../lib/format-date';

const OUTCOME: Record<ReviewRequest['state'], { label: string; color: string }> = {
  open: { label: 'Waiting', color: 'channel' },
  approved: { label: 'Signed off', color: 'green' },
  'changes-requested': { label: 'Changes requested', color: 'oxide' },
  withdrawn: { label: 'Withdrawn', color: 'gray' },
};

/** Review requests with the revision they are about, who asked whom, and where each stands. */
export function ReviewInboxTable({ requests, label }: { requests: ReviewRequest[]; label: string }) {
  return (
    <Table.ScrollContainer minWidth={900}>
    <Table aria-label={label} striped highlightOnHover fz="sm" verticalSpacing={6}>
      <Table.Thead>
        <Table.Tr>
          <Table.Th>Revision</Table.Th>
          <Table.Th>Project</Table.Th>
          <Table.Th>Asked by</Table.Th>
          <Table.Th>Reviewer</Table.Th>
          <Table.Th>Asked on</Table.Th>
          <Table.Th>State</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {requests.map((request) => (
          <Table.Tr key={request.id}>
            <Table.Td>
              <Anchor component={Link} to={`/revisions/${request.revision.id}`} fw={600}>
                {request.sheetName} {request.revision.label}
              </Anchor>
              <Text size="xs" c="dimmed" lineClamp={1}>
                {request.note || request.revision.message}
              </Text>
            </Table.Td>
            <Table.Td>{request.projectName}</Table.Td>
            <Table.Td>{request.requestedBy?.displayName ?? '—'}</Table.Td>
            <Table.Td>{request.reviewer?.displayName ?? '—'}</Table.Td>
            <Table.Td style={{ whiteSpace: 'nowrap' }}>{formatDay(request.createdAt)}</Table.Td>
            <Table.Td style={{ whiteSpace: 'nowrap' }}>
              <Badge color={OUTCOME[request.state].color} variant="light" tt="none" style={{ overflow: 'visible' }}>
                {OUTCOME[request.state].label}
              </Badge>
            </Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
    </Table.ScrollContainer>
  );
}
