import { EmptyState, Paper } from '@mantine/core';
import { IconFolders } from '@tabler/icons-react';

/** Stands where the list of projects will be once projects exist. */
export function ProjectsPlaceholder() {
  return (
    <Paper withBorder radius="md" p="xl">
      <EmptyState icon={<IconFolders size={28} stroke={1.5} />}>
        <EmptyState.Title order={2}>Your projects will appear here</EmptyState.Title>
        <EmptyState.Description>
          Projects hold the sizing sheets of a block; the ones you belong to will be listed on this page.
        </EmptyState.Description>
      </EmptyState>
    </Paper>
  );
}
