import type { RevisionDevice } from '@channelwright/shared/schemas';
import { Alert, List, Stack, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';

/** Every caution the engine raised on the frozen devices, and every device it gave no result for, in plain words. */
export function RevisionWarnings({ devices }: { devices: RevisionDevice[] }) {
  const flagged = devices.filter((device) => device.error || (device.result?.warnings.length ?? 0) > 0);
  if (flagged.length === 0) return <Text size="sm" c="dimmed">No warnings on any frozen device.</Text>;
  return (
    <Alert color="oxide" variant="light" icon={<IconAlertTriangle size={16} />} title="Warnings in this revision">
      <Stack gap={4} role="list" aria-label="Warnings in this revision">
        {flagged.map((device) => (
          <div key={device.id} role="listitem">
            <Text size="sm" fw={600}>
              {device.name}
            </Text>
            <List size="sm" spacing={0}>
              {device.error && <List.Item>No result: {device.error.message}</List.Item>}
              {(device.result?.warnings ?? []).map((warning) => (
                <List.Item key={warning.code}>{warning.message}</List.Item>
              ))}
            </List>
          </div>
        ))}
      </Stack>
    </Alert>
  );
}
