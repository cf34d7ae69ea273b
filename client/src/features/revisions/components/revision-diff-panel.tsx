import type { RevisionDiff, ValueChange } from '@channelwright/shared/schemas';
import { Badge, Group, Skeleton, Stack, Table, Text } from '@mantine/core';
import { useRevisionDiff } from '../api/get-revision-diff';
import { formatValue } from '../model/format-value';

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

/** What changed since the sheet's last signed-off revision (or says there is none to compare with). */
export function RevisionDiffPanel({ revisionId }: { revisionId: string }) {
  const diff = useRevisionDiff(revisionId);
  if (diff.isPending) return <Skeleton height={60} />;
  if (diff.isError) return <Text size="sm" c="red">The comparison could not be loaded: {diff.error.message}</Text>;
  if (diff.data.againstId === null) return <Text size="sm" c="dimmed">No earlier signed-off revision of this sheet to compare with: everything here is new to review.</Text>;
  return (
    <Stack gap="xs">
      <Text size="sm" c="dimmed">Compared with {diff.data.againstLabel}, the last signed-off revision.</Text>
      <DiffBody diff={diff.data} />
    </Stack>
  );
}
