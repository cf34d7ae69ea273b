import type { Device } from '@channelwright/shared/schemas';
import { ActionIcon, Menu } from '@mantine/core';
import { IconCopy, IconDots, IconPencil, IconTrash } from '@tabler/icons-react';
import { Link } from 'react-router-dom';

interface DeviceRowActionsProps {
  device: Device;
  href: string;
  onDuplicate: (device: Device) => void;
  onDelete: (device: Device) => void;
}

/** Open, duplicate or delete one device (designers and owners). */
export function DeviceRowActions({ device, href, onDuplicate, onDelete }: DeviceRowActionsProps) {
  const name = device.targets.name;
  return (
    <Menu position="bottom-end" withinPortal>
      <Menu.Target>
        <ActionIcon variant="subtle" color="gray" size="sm" aria-label={`Actions for ${name}`}>
          <IconDots size={14} />
        </ActionIcon>
      </Menu.Target>
      <Menu.Dropdown>
        <Menu.Item component={Link} to={href} leftSection={<IconPencil size={14} />}>
          Edit {name}
        </Menu.Item>
        <Menu.Item leftSection={<IconCopy size={14} />} onClick={() => onDuplicate(device)}>
          Duplicate {name}
        </Menu.Item>
        <Menu.Divider />
        <Menu.Item color="red" leftSection={<IconTrash size={14} />} onClick={() => onDelete(device)}>
          Delete {name}
        </Menu.Item>
      </Menu.Dropdown>
    </Menu>
  );
}
