import { Button, Group } from '@mantine/core';

/** The foot of a form in a dialog: cancel, and the submit button that shows the request under way. */
export function DialogActions({ onCancel, submitLabel, pending }: { onCancel: () => void; submitLabel: string; pending: boolean }) {
  return (
    <Group justify="flex-end" gap="xs">
      <Button variant="default" onClick={onCancel}>
        Cancel
      </Button>
      <Button type="submit" loading={pending}>
        {submitLabel}
      </Button>
    </Group>
  );
}
