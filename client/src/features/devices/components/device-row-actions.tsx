import type { Device, Sheet } from '@channelwright/shared/schemas';
import { ActionIcon, Menu } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { IconCopy, IconDots, IconPencil, IconTrash } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { useCreateDevice } from '../api/create-device';
import { useDeleteDevice } from '../api/delete-device';
import { copyName } from '../model/device-names';
import { DeleteDeviceDialog } from './delete-device-dialog';

interface DeviceRowActionsProps {
  sheet: Sheet;
  device: Device;
}

/** Open, duplicate or delete one device of a sheet (designers and owners); deleting asks first. */
export function DeviceRowActions({ sheet, device }: DeviceRowActionsProps) {
  const createDevice = useCreateDevice();
  const deleteDevice = useDeleteDevice();
  const [confirming, confirm] = useDisclosure(false);
  const name = device.targets.name;
  const duplicate = () =>
    createDevice.mutate(
      { sheetId: sheet.id, targets: { ...device.targets, name: copyName(name, sheet.devices.map((d) => d.targets.name)) } },
      { onSuccess: (copy) => notifications.show({ color: 'channel', message: `${name} duplicated as ${copy.targets.name}` }) },
    );
  const remove = () => deleteDevice.mutate({ sheetId: sheet.id, deviceId: device.id, version: device.version }, { onSettled: confirm.close });

  return (
    <>
      <Menu position="bottom-end" withinPortal>
        <Menu.Target>
          <ActionIcon variant="subtle" color="gray" size="sm" aria-label={`Actions for ${name}`}>
            <IconDots size={14} />
          </ActionIcon>
        </Menu.Target>
        <Menu.Dropdown>
          <Menu.Item component={Link} to={`/sheets/${sheet.id}/devices/${device.id}`} leftSection={<IconPencil size={14} />}>
            Edit {name}
          </Menu.Item>
          <Menu.Item leftSection={<IconCopy size={14} />} onClick={duplicate}>
            Duplicate {name}
          </Menu.Item>
          <Menu.Divider />
          <Menu.Item color="red" leftSection={<IconTrash size={14} />} onClick={confirm.open}>
            Delete {name}
          </Menu.Item>
        </Menu.Dropdown>
      </Menu>
      <DeleteDeviceDialog device={confirming ? device : null} deleting={deleteDevice.isPending} onCancel={confirm.close} onConfirm={remove} />
    </>
  );
}
