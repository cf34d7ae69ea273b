import { Button, EmptyState, Group, Paper, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconFolders, IconPlus } from '@tabler/icons-react';
import { ErrorPanel } from '../../../components/error-panel';
import { PageLoader } from '../../../components/page-loader';
import { useProjects } from '../../../lib/projects/projects';
import { NewProjectDialog } from './new-project-dialog';
import { ProjectsTable } from './projects-table';

/** The dashboard's heart: the user's projects and the way to start one. */
export function ProjectsSection() {
  const projects = useProjects();
  const [creating, dialog] = useDisclosure(false);

  let body;
  if (projects.isPending) body = <PageLoader label="Loading your projects" />;
  else if (projects.isError) body = <ErrorPanel title="Your projects could not be loaded" message={projects.error.message} onRetry={() => void projects.refetch()} />;
  else if (projects.data.length === 0)
    body = (
      <EmptyState icon={<IconFolders size={28} stroke={1.5} />} py="xl">
        <EmptyState.Title order={3}>No projects yet</EmptyState.Title>
        <EmptyState.Description>A project holds the sizing sheets of a block. Start one, or ask an owner to add you to theirs.</EmptyState.Description>
      </EmptyState>
    );
  else body = <ProjectsTable projects={projects.data} />;

  return (
    <Paper withBorder radius="md" p="md" component="section" aria-labelledby="projects-title">
      <Group justify="space-between" mb="sm">
        <Title order={2} fz="lg" id="projects-title">
          Your projects
        </Title>
        <Button size="xs" leftSection={<IconPlus size={14} />} onClick={dialog.open}>
          New project
        </Button>
      </Group>
      {body}
      <NewProjectDialog opened={creating} onClose={dialog.close} />
    </Paper>
  );
}
