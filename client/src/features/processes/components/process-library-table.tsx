import { parameterInfo, type ProcessProfileSummary } from '@channelwright/shared/schemas';
import { Anchor, Badge, Group, Table, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { InventedDataBadge } from '../../../components/invented-data-badge';
import { displayQuantity } from '../utils/display-quantity';
import { changedByAndWhen } from './format-change';

const VDD = parameterInfo('vdd')!;

/** The library: one row per profile with its latest version's digest. */
export function ProcessLibraryTable({ profiles }: { profiles: ProcessProfileSummary[] }) {
  if (profiles.length === 0) {
    return (
      <Text c="dimmed" size="sm" p="md">
        No process profile matches.
      </Text>
    );
  }
  const rows = profiles.map((profile) => (
    <Table.Tr key={profile.id}>
      <Table.Td>
        <Group gap={6} wrap="nowrap">
          <Anchor component={Link} to={`/processes/${profile.id}`} fw={600} size="sm">
            {profile.name}
          </Anchor>
          {profile.demoData && <InventedDataBadge />}
          {profile.deprecated && (
            <Badge size="sm" color="gray" variant="outline" tt="none">
              deprecated
            </Badge>
          )}
        </Group>
        {profile.description && (
          <Text size="xs" c="dimmed" lineClamp={1} maw={420}>
            {profile.description}
          </Text>
        )}
      </Table.Td>
      <Table.Td>{profile.nodeClass || '—'}</Table.Td>
      <Table.Td ff="monospace">{displayQuantity(profile.vdd, VDD)}</Table.Td>
      <Table.Td>{profile.corners.join(' ')}</Table.Td>
      <Table.Td>v{profile.latestVersion}</Table.Td>
      <Table.Td>
        <Text size="sm" c="dimmed">
          {changedByAndWhen(profile.updatedBy, profile.updatedAt)}
        </Text>
      </Table.Td>
    </Table.Tr>
  ));
  return (
    <Table.ScrollContainer minWidth={820}>
      <Table verticalSpacing="sm" highlightOnHover aria-label="Process profiles">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Name</Table.Th>
            <Table.Th>Node class</Table.Th>
            <Table.Th>VDD</Table.Th>
            <Table.Th>Corners</Table.Th>
            <Table.Th>Latest version</Table.Th>
            <Table.Th>Last changed</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>{rows}</Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
