import type { Warning } from '@channelwright/shared/schemas';
import { Alert, Stack, Text } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck } from '@tabler/icons-react';
import { WARNING_TITLES } from '../../../lib/warning-titles';

/** Every caution the engine raised for this operating point, each in plain words; or that there are none. */
export function WarningsList({ warnings, fromTables = false }: { warnings: Warning[]; fromTables?: boolean }) {
  if (warnings.length === 0) {
    return (
      <Text size="sm" c="dimmed" role="status" aria-label="Warnings">
        <IconCircleCheck size={14} style={{ verticalAlign: -2, marginRight: 6 }} />
        {fromTables ? 'No warnings: the targets lie inside the characterised grid.' : 'No warnings: the first-order model is within its range here.'}
      </Text>
    );
  }
  return (
    <Stack gap={6} role="list" aria-label="Warnings">
      {warnings.map((warning) => (
        <Alert
          key={warning.code}
          role="listitem"
          variant="light"
          color="oxide"
          radius="sm"
          p="xs"
          icon={<IconAlertTriangle size={16} />}
          title={WARNING_TITLES[warning.code]}
          styles={{ title: { fontSize: 'var(--mantine-font-size-sm)' } }}
        >
          <Text size="xs">{warning.message}</Text>
        </Alert>
      ))}
    </Stack>
  );
}
