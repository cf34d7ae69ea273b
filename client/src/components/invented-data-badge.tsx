import { Badge, Tooltip } from '@mantine/core';

/** Marks invented demo content, so nobody mistakes the demo company or processes for real ones. */
export function InventedDataBadge() {
  return (
    <Tooltip label="Brackenfold Semiconductor, its people and processes are invented for the demo">
      <Badge variant="light" color="oxide" radius="sm" tt="none">
        invented demo data
      </Badge>
    </Tooltip>
  );
}
