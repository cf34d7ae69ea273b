import type { ProcessVersionSummary } from '@channelwright/shared/schemas';
import { Badge, Group, Select, Stack, Table, Text } from '@mantine/core';
import { useState } from 'react';
import { PageLoader } from '../../../components/page-loader';
import { useProcessDiff } from '../api/get-process-diff';
import { displayByPath } from '../utils/display-quantity';

const KIND_COLOR = { changed: 'channel', added: 'teal', removed: 'red' } as const;

/** Two versions chosen side by side, and what changed between them, from what to what. */
export function VersionDiff({ profileId, versions }: { profileId: string; versions: ProcessVersionSummary[] }) {
  const latest = versions[0]?.number ?? 1;
  const [from, setFrom] = useState(Math.max(1, latest - 1));
  const [to, setTo] = useState(latest);
  const options = versions.map((v) => ({ value: String(v.number), label: `v${v.number}` }));
  const diff = useProcessDiff(profileId, from, to, versions.length > 1);

  if (versions.length < 2) return <Text size="sm" c="dimmed">There is one version so far: nothing to compare.</Text>;

  let body;
  if (diff.isPending) body = <PageLoader label="Comparing versions" />;
  else if (diff.isError) body = <Text c="red" size="sm">{diff.error.message}</Text>;
  else if (diff.data.changes.length === 0) body = <Text size="sm" c="dimmed">No value differs between v{from} and v{to}.</Text>;
  else
    body = (
      <Table.ScrollContainer minWidth={560}>
        <Table aria-label={`Changes from v${from} to v${to}`} striped withTableBorder verticalSpacing={6}>
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Parameter</Table.Th>
              <Table.Th ta="right">v{from}</Table.Th>
              <Table.Th ta="right">v{to}</Table.Th>
              <Table.Th>Change</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {diff.data.changes.map((change) => (
              <Table.Tr key={change.path}>
                <Table.Td ff="monospace">{change.path}</Table.Td>
                <Table.Td ff="monospace" ta="right">{displayByPath(change.path, change.from)}</Table.Td>
                <Table.Td ff="monospace" ta="right">{displayByPath(change.path, change.to)}</Table.Td>
                <Table.Td>
                  <Badge size="sm" variant="light" color={KIND_COLOR[change.kind]} tt="none">
                    {change.kind}
                  </Badge>
                </Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
    );

  return (
    <Stack gap="sm">
      <Group gap="sm">
        <Select label="From" data={options} value={String(from)} onChange={(v) => v && setFrom(Number(v))} allowDeselect={false} w={110} size="xs" />
        <Select label="To" data={options} value={String(to)} onChange={(v) => v && setTo(Number(v))} allowDeselect={false} w={110} size="xs" />
      </Group>
      {body}
    </Stack>
  );
}
