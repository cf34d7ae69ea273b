import { Alert, Button, Group, Text } from '@mantine/core';
import { IconGitCompare } from '@tabler/icons-react';

interface StaleEditAlertProps {
  onLoadTheirs: () => void;
  onSaveMine: () => void;
  saving: boolean;
}

/** A save refused because someone changed the device meanwhile: the designer's input stays, and they choose. */
export function StaleEditAlert({ onLoadTheirs, onSaveMine, saving }: StaleEditAlertProps) {
  return (
    <Alert color="red" variant="light" icon={<IconGitCompare size={18} />} title="Someone changed this device since you opened it" role="alert">
      <Text size="xs">Nothing was saved, and your input is still in the form. Load the stored version to see theirs, or save yours over it.</Text>
      <Group gap="xs" mt="xs">
        <Button size="compact-xs" variant="default" onClick={onLoadTheirs}>
          Load the stored version
        </Button>
        <Button size="compact-xs" color="red" variant="light" loading={saving} onClick={onSaveMine}>
          Save mine over it
        </Button>
      </Group>
    </Alert>
  );
}
