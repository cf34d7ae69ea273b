import { Group, Table, Tooltip, UnstyledButton } from '@mantine/core';
import { IconArrowDown, IconArrowUp, IconArrowsSort } from '@tabler/icons-react';
import type { SheetColumn, SortState } from '../model/sheet-columns';

interface SortableHeaderProps {
  column: SheetColumn;
  className?: string;
  sort: SortState | null;
  onSort: (key: string) => void;
}

/** A column title that sorts the table by that column; the header cell says how it is sorted. */
export function SortableHeader({ column, sort, onSort, className }: SortableHeaderProps) {
  const active = sort?.key === column.key;
  const Icon = !active ? IconArrowsSort : sort.direction === 'ascending' ? IconArrowUp : IconArrowDown;
  return (
    <Table.Th aria-sort={active ? sort.direction : 'none'} ta={column.numeric ? 'right' : 'left'} style={{ whiteSpace: 'nowrap' }} className={className}>
      <Tooltip label={column.unit ? `${column.meaning} (${column.unit})` : column.meaning} openDelay={400}>
        <UnstyledButton onClick={() => onSort(column.key)} fz="xs" fw={600}>
          <Group gap={2} wrap="nowrap" justify={column.numeric ? 'flex-end' : 'flex-start'}>
            {column.title}
            <Icon size={12} stroke={1.8} opacity={active ? 1 : 0.4} aria-hidden />
          </Group>
        </UnstyledButton>
      </Tooltip>
    </Table.Th>
  );
}
