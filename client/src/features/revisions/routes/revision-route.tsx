import { Anchor, Breadcrumbs, Group, Paper, Stack, Title } from '@mantine/core';
import { useState, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { RegionErrorBoundary } from '../../../components/region-error-boundary';
import { useProject } from '../../../lib/projects/project';
import { useReviewRequests } from '../api/get-review-requests';
import { useRevision } from '../api/get-revision';
import { useSheetReviewState } from '../api/get-sheet-review-state';
import { CommentsPanel } from '../components/comments-panel';
import { DecisionPanel } from '../components/decision-panel';
import { RevisionDeviceTable } from '../components/revision-device-table';
import { RevisionDiffPanel } from '../components/revision-diff-panel';
import { RevisionStateBadge } from '../components/revision-state-badge';
import { RevisionSummary } from '../components/revision-summary';
import { RevisionWarnings } from '../components/revision-warnings';
import { REVISION_STATE_LOOK } from '../model/revision-state-look';

const COMMENTING_ROLES = ['owner', 'designer', 'reviewer'];

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Stack gap="xs" component="section" aria-label={title}>
      <Title order={2} fz="lg">
        {title}
      </Title>
      <RegionErrorBoundary region={`the ${title.toLowerCase()} section`}>{children}</RegionErrorBoundary>
    </Stack>
  );
}

/** One revision, read-only: what was frozen, its warnings, what changed since the last sign-off, the review and its comments. */
export default function RevisionRoute() {
  const { revisionId = '' } = useParams();
  const revision = useRevision(revisionId);
  const requests = useReviewRequests(revisionId);
  const project = useProject(revision.data?.projectId);
  const history = useSheetReviewState(revision.data?.sheetId ?? '');
  const [commentTarget, setCommentTarget] = useState('');
  const [commentBody, setCommentBody] = useState('');

  if (revision.isPending) return <PageLoader label="Loading the revision" />;
  if (revision.isError) return <ErrorPanel title="The revision could not be loaded" message={revision.error.message} onRetry={() => void revision.refetch()} />;
  const data = revision.data;
  const role = project.data?.myRole ?? null;
  const canComment = role !== null && COMMENTING_ROLES.includes(role);

  return (
    <Stack gap="md">
      <Breadcrumbs>
        {project.data && <Anchor component={Link} to={`/projects/${data.projectId}`} size="sm">{project.data.name}</Anchor>}
        <Anchor component={Link} to={`/sheets/${data.sheetId}`} size="sm">{data.sheet.name}</Anchor>
        <Anchor component={Link} to={`/projects/${data.projectId}/audit`} size="sm">Audit trail</Anchor>
      </Breadcrumbs>
      <PageHeader
        title={`${data.sheet.name} ${data.label}`}
        description={data.message}
        actions={
          <Group gap="xs">
            <RevisionStateBadge state={data.state} size="lg" aria-label={`State: ${REVISION_STATE_LOOK[data.state].label}`} />
          </Group>
        }
      />
      <RevisionSummary revision={data} />
      <Section title="Review">
        {requests.isError ? <ErrorPanel title="The review requests could not be loaded" message={requests.error.message} /> : <DecisionPanel requests={requests.data ?? []} />}
      </Section>
      <Section title="Changes">
        <RevisionDiffPanel revisionId={data.id} earlier={(history.data?.revisions ?? []).filter((r) => r.number < data.number)} />
      </Section>
      <Section title="Devices">
        <Paper withBorder radius="sm" p={0}>
          <RevisionDeviceTable devices={data.devices} deviceHref={(device) => `/revisions/${data.id}/devices/${device.id}`} onComment={canComment ? (device) => setCommentTarget(device.id) : undefined} />
        </Paper>
        <RevisionWarnings devices={data.devices} />
      </Section>
      <Section title="Comments">
        <CommentsPanel
          revisionId={data.id}
          devices={data.devices}
          canComment={canComment}
          target={commentTarget}
          onTargetChange={setCommentTarget}
          body={commentBody}
          onBodyChange={setCommentBody}
        />
      </Section>
    </Stack>
  );
}
