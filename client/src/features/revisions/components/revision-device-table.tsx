import type { RevisionDevice } from '@channelwright/shared/schemas';
import { ActionIcon, Badge, Table, Text, Tooltip } from '@mantine/core';
import { IconMessagePlus } from '@tabler/icons-react';
import { Quantity } from '../../../components/quantity';

interface RevisionDeviceTableProps {
  devices: RevisionDevice[];
  /** Present for those who may comment: opens the comment form on this device. */
  onComment?: (device: RevisionDevice) => void;
}

/** The frozen devices, read-only: key figures with units, and whether each carries warnings. */
export function RevisionDeviceTable({ devices, onComment }: RevisionDeviceTableProps) {
  return (
    <Table.ScrollContainer minWidth={960}>
      <Table aria-label="Frozen devices" striped fz="sm" verticalSpacing={4} horizontalSpacing={8}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Name</Table.Th>
            <Table.Th>Function</Table.Th>
            <Table.Th>Polarity</Table.Th>
            <Table.Th ta="right">W</Table.Th>
            <Table.Th ta="right">L</Table.Th>
            <Table.Th ta="right">ID</Table.Th>
            <Table.Th ta="right">VOV</Table.Th>
            <Table.Th ta="right">gm/ID</Table.Th>
            <Table.Th>Region</Table.Th>
            <Table.Th>Warnings</Table.Th>
            {onComment && <Table.Th aria-label="Comment" />}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {devices.map((device) => {
            const r = device.result;
            const warnings = r?.warnings ?? [];
            return (
              <Table.Tr key={device.id}>
                <Table.Td fw={600}>{device.name}</Table.Td>
                <Table.Td c="dimmed">{device.targets.function || '—'}</Table.Td>
                <Table.Td>{device.targets.polarity.toUpperCase()}</Table.Td>
                <Table.Td ta="right"><Quantity value={r?.w} unit="m" /></Table.Td>
                <Table.Td ta="right"><Quantity value={r?.l ?? device.targets.l} unit="m" /></Table.Td>
                <Table.Td ta="right"><Quantity value={r?.id ?? device.targets.id} unit="A" /></Table.Td>
                <Table.Td ta="right"><Quantity value={r?.vov} unit="V" /></Table.Td>
                <Table.Td ta="right"><Quantity value={r?.gmId} unit="1/V" digits={3} /></Table.Td>
                <Table.Td>{r?.region ?? '—'}</Table.Td>
                <Table.Td>
                  {device.error ? (
                    <Badge color="red" variant="light" radius="sm" tt="none" title={device.error.message}>No result</Badge>
                  ) : warnings.length > 0 ? (
                    <Tooltip label={warnings.map((w) => w.message).join(' ')} multiline w={320}>
                      <Badge color="oxide" variant="light" radius="sm" tt="none">{warnings.length === 1 ? '1 warning' : `${warnings.length} warnings`}</Badge>
                    </Tooltip>
                  ) : (
                    <Text span size="xs" c="dimmed">none</Text>
                  )}
                </Table.Td>
                {onComment && (
                  <Table.Td>
                    <ActionIcon variant="subtle" color="gray" size="sm" aria-label={`Comment on ${device.name}`} onClick={() => onComment(device)}>
                      <IconMessagePlus size={16} />
                    </ActionIcon>
                  </Table.Td>
                )}
              </Table.Tr>
            );
          })}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
