import { Anchor, Button, EmptyState, Paper, Stack, Text } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { IconDownload, IconHistory } from '@tabler/icons-react';
import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { isApiError } from '../../../lib/api-error';
import { useProject } from '../../../lib/projects/project';
import type { AuditFilters } from '../api/audit-filters';
import { useExportProjectAudit } from '../api/export-project-audit';
import { useProjectAudit } from '../api/get-project-audit';
import { AuditFilterBar } from '../components/audit-filter-bar';
import { AuditTable } from '../components/audit-table';

/** A project's audit trail: every change, decision and comment, filtered, and downloadable as CSV. */
export default function ProjectAuditRoute() {
  const { projectId = '' } = useParams();
  const project = useProject(projectId);
  const [filters, setFilters] = useState<AuditFilters>({});
  const [debounced] = useDebouncedValue(filters, 300);
  const audit = useProjectAudit(projectId, debounced);
  const download = useExportProjectAudit();
  const refused = audit.error && isApiError(audit.error) && audit.error.status === 400 ? audit.error : null;

  let body;
  if (audit.isPending) body = <PageLoader label="Loading the audit trail" />;
  else if (audit.isError && !refused) body = <ErrorPanel title="The audit trail could not be loaded" message={audit.error.message} onRetry={() => void audit.refetch()} />;
  else if ((audit.data ?? []).length === 0)
    body = (
      <Paper withBorder radius="sm" p="xl">
        <EmptyState icon={<IconHistory size={28} stroke={1.5} />}>
          <EmptyState.Title order={2}>No events</EmptyState.Title>
          <EmptyState.Description>Nothing recorded matches these filters.</EmptyState.Description>
        </EmptyState>
      </Paper>
    );
  else
    body = (
      <Paper withBorder radius="sm" p={0}>
        <AuditTable events={audit.data ?? []} />
      </Paper>
    );

  return (
    <Stack gap="sm">
      {project.data && (
        <Anchor component={Link} to={`/projects/${projectId}`} size="sm">
          ← {project.data.name}
        </Anchor>
      )}
      <PageHeader
        title="Audit trail"
        description="Every state change, decision, comment, membership change and edit, in an append-only record."
        actions={
          <Button size="xs" variant="default" leftSection={<IconDownload size={14} />} loading={download.isPending} onClick={() => download.mutate({ projectId, filters: debounced })}>
            Download CSV
          </Button>
        }
      />
      <AuditFilterBar filters={filters} onChange={setFilters} error={refused} />
      {refused && !refused.field && <Text size="sm" c="red">{refused.message}</Text>}
      {body}
    </Stack>
  );
}
