import { Badge, Button, EmptyState, Grid, Group, Paper, Stack, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconHistory, IconPlus, IconTable } from '@tabler/icons-react';
import { Link, useParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { useProject } from '../../../lib/projects/project';
import { canEditSheets, canManageMembers } from '../../../lib/projects/project-permissions';
import { useSignedInUser } from '../../../lib/session/current-user';
import { useProjectSheets } from '../../../lib/sheets/project-sheets';
import { MembersPanel } from '../components/members-panel';
import { NewSheetDialog } from '../components/new-sheet-dialog';
import { ROLE_LABELS } from '../components/role-labels';
import { SheetsTable } from '../components/sheets-table';

/** A project: its sheets, and who works on it. */
export default function ProjectRoute() {
  const { projectId = '' } = useParams();
  const user = useSignedInUser();
  const project = useProject(projectId);
  const sheets = useProjectSheets(projectId);
  const [creating, dialog] = useDisclosure(false);

  if (project.isPending) return <PageLoader label="Loading the project" />;
  if (project.isError) return <ErrorPanel title="The project could not be loaded" message={project.error.message} onRetry={() => void project.refetch()} />;
  const data = project.data;
  const editable = canEditSheets(data);

  let sheetsBody;
  if (sheets.isPending) sheetsBody = <PageLoader label="Loading the sheets" />;
  else if (sheets.isError) sheetsBody = <ErrorPanel title="The sheets could not be loaded" message={sheets.error.message} onRetry={() => void sheets.refetch()} />;
  else if (sheets.data.length === 0)
    sheetsBody = (
      <EmptyState icon={<IconTable size={28} stroke={1.5} />} py="lg">
        <EmptyState.Title order={3}>No sheets yet</EmptyState.Title>
        <EmptyState.Description>A sheet holds every transistor of one circuit, sized in one process version.</EmptyState.Description>
      </EmptyState>
    );
  else sheetsBody = <SheetsTable sheets={sheets.data} />;

  return (
    <>
      <PageHeader
        title={data.name}
        description={data.description || undefined}
        actions={
          <Group gap="xs">
            <Button variant="default" size="xs" leftSection={<IconHistory size={14} />} component={Link} to={`/projects/${data.id}/audit`}>
              Audit trail
            </Button>
            <Badge variant="light" radius="sm" tt="none" size="lg">
              {data.myRole ? `You are ${ROLE_LABELS[data.myRole].toLowerCase()}` : 'Administrator, not a member'}
            </Badge>
          </Group>
        }
      />
      <Grid gap="sm" align="flex-start">
        <Grid.Col span={{ base: 12, xl: 8 }}>
          <Paper withBorder radius="sm" p="sm" component="section" aria-labelledby="sheets-title">
            <Stack gap="xs">
              <Group justify="space-between">
                <Title order={2} fz="md" id="sheets-title">
                  Sheets
                </Title>
                {editable && (
                  <Button size="xs" leftSection={<IconPlus size={14} />} onClick={dialog.open}>
                    New sheet
                  </Button>
                )}
              </Group>
              {sheetsBody}
            </Stack>
          </Paper>
        </Grid.Col>
        <Grid.Col span={{ base: 12, xl: 4 }}>
          <MembersPanel projectId={projectId} manage={canManageMembers(data, user)} currentUserId={user.id} />
        </Grid.Col>
      </Grid>
      {editable && <NewSheetDialog projectId={projectId} opened={creating} onClose={dialog.close} />}
    </>
  );
}
