import type { RevisionDiff, RevisionSummary, ValueChange } from '@channelwright/shared/schemas';
import { Badge, Group, Select, Skeleton, Stack, Table, Text } from '@mantine/core';
import { useState } from 'react';
import { useRevisionDiff } from '../api/get-revision-diff';
import { formatValue } from '../model/format-value';
import { REVISION_STATE_LOOK } from '../model/revision-state-look';

function ChangesTable({ label, changes }: { label: string; changes: ValueChange[] }) {
  return (
    <Table aria-label={label} fz="xs" verticalSpacing={2} withRowBorders={false}>
      <Table.Tbody>
        {changes.map((change) => (
          <Table.Tr key={change.path}>
            <Table.Td ff="monospace" w="40%">{change.path}</Table.Td>
            <Table.Td ff="monospace">{formatValue(change.path, change.from)}</Table.Td>
            <Table.Td aria-hidden>→</Table.Td>
            <Table.Td ff="monospace">{formatValue(change.path, change.to)}</Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}

function DiffBody({ diff }: { diff: RevisionDiff }) {
  const nothing = diff.added.length + diff.removed.length + diff.changed.length + diff.sheetChanges.length === 0;
  if (nothing) return <Text size="sm">Nothing changed since {diff.againstLabel}.</Text>;
  return (
    <Stack gap="xs">
      {diff.sheetChanges.length > 0 && <ChangesTable label="Sheet changes" changes={diff.sheetChanges} />}
      {diff.added.length > 0 && (
        <Group gap={6}>
          <Text size="sm">Added:</Text>
          {diff.added.map((d) => <Badge key={d.id} color="green" variant="light" tt="none">{d.name}</Badge>)}
        </Group>
      )}
      {diff.removed.length > 0 && (
        <Group gap={6}>
          <Text size="sm">Removed:</Text>
          {diff.removed.map((d) => <Badge key={d.id} color="red" variant="light" tt="none">{d.name}</Badge>)}
        </Group>
      )}
      {diff.changed.map((device) => (
        <Stack key={device.id} gap={2}>
          <Text size="sm" fw={600}>{device.name} changed</Text>
          <ChangesTable label={`Changes of ${device.name}`} changes={device.changes} />
        </Stack>
      ))}
    </Stack>
  );
}

const LAST_SIGNED_OFF = 'last-signed-off';

interface RevisionDiffPanelProps {
  revisionId: string;
  /** The sheet's earlier revisions (any state, rejected ones too), newest first, to compare with. */
  earlier: RevisionSummary[];
}

/** What changed since the last signed-off revision, or since any earlier revision the reader picks. */
export function RevisionDiffPanel({ revisionId, earlier }: RevisionDiffPanelProps) {
  const [against, setAgainst] = useState(LAST_SIGNED_OFF);
  const diff = useRevisionDiff(revisionId, against === LAST_SIGNED_OFF ? undefined : against);
  const choices = [
    { value: LAST_SIGNED_OFF, label: 'the last signed-off revision' },
    ...earlier.map((r) => ({ value: r.id, label: `${r.label} (${REVISION_STATE_LOOK[r.state].label.toLowerCase()}) — ${r.message}` })),
  ];
  return (
    <Stack gap="xs">
      <Select label="Compare with" size="xs" maw={520} data={choices} value={against} onChange={(value) => setAgainst(value ?? LAST_SIGNED_OFF)} allowDeselect={false} />
      {diff.isPending ? (
        <Skeleton height={60} />
      ) : diff.isError ? (
        <Text size="sm" c="red">The comparison could not be loaded: {diff.error.message}</Text>
      ) : diff.data.againstId === null ? (
        <Text size="sm" c="dimmed">No earlier signed-off revision of this sheet to compare with: everything here is new to review. Pick an earlier revision above to compare with it.</Text>
      ) : (
        <Stack gap="xs">
          <Text size="sm" c="dimmed">Compared with {diff.data.againstLabel}{against === LAST_SIGNED_OFF ? ', the last signed-off revision' : ''}.</Text>
          <DiffBody diff={diff.data} />
        </Stack>
      )}
    </Stack>
  );
}
