import { Button, EmptyState } from '@mantine/core';
import { IconMapOff } from '@tabler/icons-react';
import { Link } from 'react-router-dom';

/** Shown for unknown addresses and for pages the user may not open (without saying which). */
export function NotFoundPage() {
  return (
    <EmptyState mt="xl" icon={<IconMapOff size={28} stroke={1.5} />}>
      <EmptyState.Title order={1}>Nothing at this address</EmptyState.Title>
      <EmptyState.Description>The page does not exist, or it is not available to your account.</EmptyState.Description>
      <EmptyState.Actions>
        <Button component={Link} to="/" variant="light">
          Back to home
        </Button>
      </EmptyState.Actions>
    </EmptyState>
  );
}
