import type { RevisionDevice } from '@channelwright/shared/schemas';
import { ActionIcon, Anchor, Badge, SimpleGrid, Table, Text, Tooltip } from '@mantine/core';
import { IconChevronDown, IconChevronRight, IconMessagePlus } from '@tabler/icons-react';
import { Fragment, useState } from 'react';
import { Link } from 'react-router-dom';
import { Quantity } from '../../../components/quantity';
import { ResultGroupTable } from '../../../components/result-group-table';
import { resultGroups } from '../../../lib/results/result-groups';

interface RevisionDeviceTableProps {
  devices: RevisionDevice[];
  /** The read-only page of one frozen device. */
  deviceHref: (device: RevisionDevice) => string;
  /** Present for those who may comment: opens the comment form on this device. */
  onComment?: (device: RevisionDevice) => void;
}

const COLUMNS = 11;

/** The frozen devices, read-only: key figures with units and warnings; each opens to every stored figure. */
export function RevisionDeviceTable({ devices, deviceHref, onComment }: RevisionDeviceTableProps) {
  const [open, setOpen] = useState<ReadonlySet<string>>(new Set());
  const toggle = (id: string) => setOpen((current) => {
    const next = new Set(current);
    if (next.has(id)) next.delete(id);
    else next.add(id);
    return next;
  });
  return (
    <Table.ScrollContainer minWidth={960}>
      <Table aria-label="Frozen devices" striped fz="sm" verticalSpacing={4} horizontalSpacing={8}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th w={28} aria-label="Every figure" />
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
            const expanded = open.has(device.id);
            return (
              <Fragment key={device.id}>
                <Table.Tr>
                  <Table.Td>
                    {r && (
                      <ActionIcon variant="subtle" color="gray" size="sm" aria-expanded={expanded} aria-label={`${expanded ? 'Hide' : 'Show'} every figure of ${device.name}`} onClick={() => toggle(device.id)}>
                        {expanded ? <IconChevronDown size={16} /> : <IconChevronRight size={16} />}
                      </ActionIcon>
                    )}
                  </Table.Td>
                  <Table.Td fw={600}>
                    <Anchor component={Link} to={deviceHref(device)} size="sm" fw={600}>
                      {device.name}
                    </Anchor>
                  </Table.Td>
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
                {expanded && r && (
                  <Table.Tr>
                    <Table.Td colSpan={COLUMNS + (onComment ? 1 : 0)} p="xs">
                      <SimpleGrid cols={{ base: 1, md: 2, xl: 3 }} spacing="xs" verticalSpacing="xs" aria-label={`Every figure of ${device.name}`} role="group">
                        {resultGroups(r, device.targets.polarity).map((group) => (
                          <ResultGroupTable key={group.title} group={group} idPrefix={device.id} />
                        ))}
                      </SimpleGrid>
                    </Table.Td>
                  </Table.Tr>
                )}
              </Fragment>
            );
          })}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
