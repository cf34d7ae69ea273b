import type { Device } from '@channelwright/shared/schemas';
import { Badge, Group, List, Text, Tooltip } from '@mantine/core';
import { WARNING_TITLES } from '../../../lib/warning-titles';

/** The warnings cell: how many cautions, each one's title on hover; or why the engine gave no result. */
export function DeviceStatus({ device }: { device: Device }) {
  if (!device.result) {
    return (
      <Tooltip label={device.error?.message ?? 'No result'} multiline w={320}>
        <Badge color="red" variant="light" radius="sm" tt="none">
          not sized
        </Badge>
      </Tooltip>
    );
  }
  const warnings = device.result.warnings;
  return (
    <Group gap={4} wrap="nowrap">
      {device.stale && (
        <Tooltip label={`Computed with another ${device.staleReasons.join(' and ')} version: recompute the sheet`}>
          <Badge color="gray" variant="outline" radius="sm" tt="none">
            stale
          </Badge>
        </Tooltip>
      )}
      {warnings.length === 0 ? (
        <Text size="xs" c="dimmed" aria-label="No warnings">
          none
        </Text>
      ) : (
        <Tooltip
          multiline
          w={340}
          label={
            <List size="xs" spacing={2}>
              {warnings.map((w) => (
                <List.Item key={w.code}>{WARNING_TITLES[w.code]}</List.Item>
              ))}
            </List>
          }
        >
          <Badge color="oxide" variant="light" radius="sm" tt="none" aria-label={`${warnings.length} warnings: ${warnings.map((w) => WARNING_TITLES[w.code]).join('; ')}`}>
            {warnings.length} {warnings.length === 1 ? 'warning' : 'warnings'}
          </Badge>
        </Tooltip>
      )}
    </Group>
  );
}
