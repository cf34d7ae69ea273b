import type { Device } from '@channelwright/shared/schemas';
import { Anchor, Table, Text, VisuallyHidden } from '@mantine/core';
import { useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Quantity } from '../../../components/quantity';
import { SHEET_COLUMNS, sortDevices, type SheetColumn, type SortState } from '../model/sheet-columns';
import { DeviceStatus } from './device-status';
import classes from './device-table.module.css';
import { SortableHeader } from './sortable-header';

interface DeviceTableProps {
  devices: Device[];
  deviceHref: (device: Device) => string;
  /** Present for designers and owners: what each row offers (the page composes the devices' actions in). */
  rowActions?: (device: Device) => ReactNode;
}

function Cell({ column, device, href }: { column: SheetColumn; device: Device; href: string }) {
  if (column.key === 'name') {
    return (
      <Anchor component={Link} to={href} fw={600} size="sm">
        {device.targets.name}
      </Anchor>
    );
  }
  if (column.key === 'warnings') return <DeviceStatus device={device} />;
  const value = column.value(device);
  if (typeof value === 'number') return <Quantity value={value} unit={column.unit} digits={column.key === 'fingers' ? 6 : 4} />;
  return (
    <Text component="span" inherit c={column.key === 'function' ? 'dimmed' : undefined} lineClamp={column.key === 'function' ? 1 : undefined} title={column.key === 'function' ? String(value ?? '') : undefined}>
      {value ?? '—'}
    </Text>
  );
}

/** Every device of the sheet with its key figures, sortable by any column, numbers right-aligned with units. */
export function DeviceTable({ devices, deviceHref, rowActions }: DeviceTableProps) {
  const [sort, setSort] = useState<SortState | null>(null);
  const toggle = (key: string) =>
    setSort((current) => (current?.key !== key ? { key, direction: 'ascending' } : current.direction === 'ascending' ? { key, direction: 'descending' } : null));
  const rows = sortDevices(devices, sort);

  return (
    <Table.ScrollContainer minWidth={1320}>
      <Table aria-label="Devices" striped highlightOnHover stickyHeader fz="xs" verticalSpacing={5} horizontalSpacing={7}>
        <Table.Thead>
          <Table.Tr>
            {SHEET_COLUMNS.map((column) => (
              <SortableHeader key={column.key} column={column} sort={sort} onSort={toggle} className={column.key === 'name' ? classes.nameCell : undefined} />
            ))}
            {rowActions && (
              <Table.Th>
                <VisuallyHidden>Actions</VisuallyHidden>
              </Table.Th>
            )}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {rows.map((device) => (
            <Table.Tr key={device.id} data-device={device.targets.name}>
              {SHEET_COLUMNS.map((column) => (
                <Table.Td
                  key={column.key}
                  ta={column.numeric ? 'right' : 'left'}
                  className={column.key === 'name' ? classes.nameCell : undefined}
                  style={column.key === 'function' ? { minWidth: 130, maxWidth: 170 } : { whiteSpace: 'nowrap', minWidth: column.key === 'warnings' ? 104 : undefined }}
                >
                  <Cell column={column} device={device} href={deviceHref(device)} />
                </Table.Td>
              ))}
              {rowActions && <Table.Td w={36}>{rowActions(device)}</Table.Td>}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
