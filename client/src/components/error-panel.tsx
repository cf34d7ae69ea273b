import { Alert, Button, Stack, Text } from '@mantine/core';
import { IconBug } from '@tabler/icons-react';

interface ErrorPanelProps {
  title: string;
  message: string;
  retryLabel?: string;
  onRetry?: () => void;
}

/** How a failed region or page says so: what failed, the reason, and a way to try again. */
export function ErrorPanel({ title, message, retryLabel = 'Try again', onRetry }: ErrorPanelProps) {
  return (
    <Alert color="red" variant="light" icon={<IconBug size={18} />} title={title}>
      <Stack gap="xs" align="flex-start">
        <Text size="sm">{message}</Text>
        {onRetry && (
          <Button size="xs" variant="default" onClick={onRetry}>
            {retryLabel}
          </Button>
        )}
      </Stack>
    </Alert>
  );
}
