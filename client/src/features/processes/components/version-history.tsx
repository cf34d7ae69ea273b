import type { ProcessVersionSummary } from '@channelwright/shared/schemas';
import { Anchor, Badge, Table, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { changedByAndWhen } from './format-change';

interface VersionHistoryProps {
  profileId: string;
  versions: ProcessVersionSummary[];
  /** The version the page shows. */
  shown: number;
}

/** Every version, newest first, each readable on its own. */
export function VersionHistory({ profileId, versions, shown }: VersionHistoryProps) {
  const latest = versions[0]?.number;
  return (
    <Table aria-label="Version history" verticalSpacing={6}>
      <Table.Thead>
        <Table.Tr>
          <Table.Th>Version</Table.Th>
          <Table.Th>What changed</Table.Th>
          <Table.Th>By, when</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {versions.map((version) => (
          <Table.Tr key={version.id} bg={version.number === shown ? 'var(--mantine-primary-color-light)' : undefined}>
            <Table.Td>
              <Anchor component={Link} to={version.number === latest ? `/processes/${profileId}` : `/processes/${profileId}?version=${version.number}`} size="sm">
                v{version.number}
              </Anchor>
              {version.number === latest && (
                <Badge size="xs" variant="light" ml={6} tt="none">
                  latest
                </Badge>
              )}
            </Table.Td>
            <Table.Td>
              <Text size="sm">{version.message || '—'}</Text>
            </Table.Td>
            <Table.Td>
              <Text size="sm" c="dimmed">
                {changedByAndWhen(version.author, version.createdAt)}
              </Text>
            </Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}
