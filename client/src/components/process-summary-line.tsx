import type { ProcessProfileSummary } from '@channelwright/shared/schemas';
import { Badge, Group, Text } from '@mantine/core';

/** One line about a process profile: its class, supply and tnom, and whether it is invented demo data. */
export function ProcessSummaryLine({ profile }: { profile: Pick<ProcessProfileSummary, 'nodeClass' | 'vdd' | 'tnom' | 'demoData'> }) {
  return (
    <Group gap={6}>
      <Text size="xs" c="dimmed">
        {profile.nodeClass} · VDD {profile.vdd} V · tnom {profile.tnom} °C
      </Text>
      {profile.demoData && (
        <Badge size="xs" variant="light" color="oxide" radius="sm" tt="none">
          invented demo data
        </Badge>
      )}
    </Group>
  );
}
