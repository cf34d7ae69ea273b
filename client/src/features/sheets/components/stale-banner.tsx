import type { Sheet } from '@channelwright/shared/schemas';
import { Alert, Button, Group, Text } from '@mantine/core';
import { IconRefresh } from '@tabler/icons-react';

interface StaleBannerProps {
  sheet: Sheet;
  /** Present for designers and owners. */
  onRecompute?: () => void;
  recomputing: boolean;
}

/** Says when stored results were made by another engine or process version, and offers the recompute. */
export function StaleBanner({ sheet, onRecompute, recomputing }: StaleBannerProps) {
  if (!sheet.stale) return null;
  const staleDevices = sheet.devices.filter((d) => d.stale);
  const reasons = new Set(staleDevices.flatMap((d) => d.staleReasons));
  // Each result names the process it was computed on: after a move to another profile that is not the sheet's.
  const computedOn = [...new Set(staleDevices.filter((d) => d.staleReasons.includes('process')).map((d) => `${d.computedWith.processName} v${d.computedWith.processVersion}`))];
  const why = [reasons.has('engine') && 'another engine version', reasons.has('process') && `${computedOn.join(', ')} (the sheet is now on ${sheet.process.name} v${sheet.process.version})`].filter(Boolean).join(' and ');
  return (
    <Alert color="oxide" variant="light" title="Some results are out of date" role="alert">
      <Group justify="space-between" align="center" wrap="wrap" gap="sm">
        <Text size="sm">
          {sheet.staleCount} of {sheet.deviceCount} devices were computed with {why || 'other inputs'}; their numbers may differ from what this sheet would give now: {staleDevices.map((d) => d.targets.name).join(', ')}.
        </Text>
        {onRecompute ? (
          <Button size="xs" leftSection={<IconRefresh size={14} />} loading={recomputing} onClick={onRecompute}>
            Recompute the sheet
          </Button>
        ) : (
          <Text size="xs" c="dimmed">
            A designer of the project can recompute it.
          </Text>
        )}
      </Group>
    </Alert>
  );
}
