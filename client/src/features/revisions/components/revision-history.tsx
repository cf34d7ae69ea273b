import type { RevisionSummary } from '@channelwright/shared/schemas';
import { Anchor, Group, Stack, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { RevisionStateBadge } from './revision-state-badge';
import { formatDateTime } from '../../../lib/format-date';

/** The sheet's revisions, newest first, each with its state and a link to its page. */
export function RevisionHistory({ revisions }: { revisions: RevisionSummary[] }) {
  if (revisions.length === 0) return <Text size="sm" c="dimmed">No revision yet: freeze the sheet to send it to review.</Text>;
  return (
    <Stack gap={6} role="list" aria-label="Revisions">
      {revisions.map((revision) => (
        <Group key={revision.id} gap="xs" role="listitem" wrap="nowrap" align="baseline">
          <Anchor component={Link} to={`/revisions/${revision.id}`} fw={600} size="sm" miw={28}>
            {revision.label}
          </Anchor>
          <RevisionStateBadge state={revision.state} size="sm" />
          <Text size="sm" lineClamp={1} style={{ flex: 1 }}>
            {revision.message}
          </Text>
          <Text size="xs" c="dimmed" style={{ whiteSpace: 'nowrap' }}>
            {revision.author?.displayName ?? 'someone'} · {formatDateTime(revision.createdAt)}
          </Text>
        </Group>
      ))}
    </Stack>
  );
}
