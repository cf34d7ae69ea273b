import type { SheetReviewState } from '@channelwright/shared/schemas';
import { Anchor, Button, Group, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconLock, IconSend } from '@tabler/icons-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { useProject } from '../../../lib/projects/project';
import { canEditSheets } from '../../../lib/projects/project-permissions';
import { useSheetReviewState } from '../api/get-sheet-review-state';
import { REVISION_STATE_LOOK } from '../model/revision-state-look';
import { FreezeDialog } from './freeze-dialog';
import { RequestReviewDialog } from './request-review-dialog';
import { RevisionHistory } from './revision-history';
import { RevisionStateBadge } from './revision-state-badge';

interface RevisionPanelProps {
  sheetId: string;
  /** For the dialog titles; "the sheet" when absent. */
  sheetName?: string;
}

function stateSentence(state: SheetReviewState): string {
  const latest = state.latestRevision;
  if (!latest) return 'Not frozen yet. Freeze the sheet into a revision to send it to review.';
  const signed = state.lastSignedOff;
  const parts = [
    signed ? `${signed.label} signed off by ${signed.signOff?.by?.displayName ?? 'a reviewer'}.` : 'Nothing signed off yet.',
    latest.id !== signed?.id ? `Latest: ${latest.label}.` : '',
    state.changedSinceLatest ? `The sheet has changed since ${latest.label}.` : `The sheet matches ${latest.label}.`,
  ];
  return parts.filter(Boolean).join(' ');
}

/**
 * The sheet's place in review: its state, the last sign-off, whether it changed since, the history
 * of revisions, and for designers and owners the way to freeze a revision and ask for a review.
 */
export function RevisionPanel({ sheetId, sheetName = 'the sheet' }: RevisionPanelProps) {
  const reviewState = useSheetReviewState(sheetId);
  const project = useProject(reviewState.data?.projectId);
  const [dialog, setDialog] = useState<'freeze' | 'request' | null>(null);

  if (reviewState.isPending) return <Skeleton height={96} radius="sm" />;
  if (reviewState.isError) return <Text size="sm" c="red">The review state could not be loaded: {reviewState.error.message}</Text>;
  const state = reviewState.data;
  const editable = project.data ? canEditSheets(project.data) : false;
  const latest = state.latestRevision;

  return (
    <Paper withBorder radius="sm" p="sm" component="section" aria-label="Review and sign-off">
      <Stack gap="xs">
        <Group justify="space-between" wrap="wrap" gap="xs">
          <Group gap="xs">
            <Title order={2} fz="md">
              Review
            </Title>
            <RevisionStateBadge state={state.state} aria-label={`Review state: ${REVISION_STATE_LOOK[state.state].label}`} />
          </Group>
          <Group gap="xs">
            {latest && (
              <Anchor component={Link} to={`/revisions/${latest.id}`} size="sm">
                Open {latest.label}
              </Anchor>
            )}
            {editable && latest?.state === 'draft' && !state.changedSinceLatest && (
              <Button size="xs" variant="default" leftSection={<IconSend size={14} />} onClick={() => setDialog('request')}>
                Request review of {latest.label}
              </Button>
            )}
            {editable && (
              <Button size="xs" leftSection={<IconLock size={14} />} onClick={() => setDialog('freeze')}>
                Freeze revision
              </Button>
            )}
          </Group>
        </Group>
        <Text size="sm">{stateSentence(state)}</Text>
        <RevisionHistory revisions={state.revisions.slice(0, 5)} />
      </Stack>
      <FreezeDialog sheetId={sheetId} projectId={state.projectId} sheetName={sheetName} opened={dialog === 'freeze'} onClose={() => setDialog(null)} />
      {latest && <RequestReviewDialog revisionId={latest.id} label={latest.label} projectId={state.projectId} opened={dialog === 'request'} onClose={() => setDialog(null)} />}
    </Paper>
  );
}
