import type { Device } from '@channelwright/shared/schemas';
import { Button, Group, Modal, Text } from '@mantine/core';

interface DeleteDeviceDialogProps {
  device: Device | null;
  deleting: boolean;
  onCancel: () => void;
  onConfirm: (device: Device) => void;
}

/** Asks before a device and its results leave the sheet. */
export function DeleteDeviceDialog({ device, deleting, onCancel, onConfirm }: DeleteDeviceDialogProps) {
  return (
    <Modal opened={device !== null} onClose={onCancel} title={device ? `Delete ${device.targets.name}?` : ''} size="sm" centered>
      <Text size="sm">Its targets and results leave the sheet. This cannot be undone.</Text>
      <Group justify="flex-end" mt="md" gap="xs">
        <Button variant="default" size="xs" onClick={onCancel}>
          Keep it
        </Button>
        <Button color="red" size="xs" loading={deleting} onClick={() => device && onConfirm(device)}>
          Delete
        </Button>
      </Group>
    </Modal>
  );
}
