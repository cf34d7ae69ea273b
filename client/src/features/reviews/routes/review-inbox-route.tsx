import type { ReviewInboxQuery } from '@channelwright/shared/schemas';
import { EmptyState, Group, Paper, SegmentedControl, Stack, Switch } from '@mantine/core';
import { IconChecklist } from '@tabler/icons-react';
import { useState } from 'react';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { useReviewInbox } from '../api/get-review-inbox';
import { ReviewInboxTable } from '../components/review-inbox-table';

const VIEWS = [
  { value: 'assigned', label: 'Assigned to me' },
  { value: 'authored', label: 'Asked by me' },
] as const;

/** The review inbox: requests waiting for the signed-in user's decision, and those they sent. */
export default function ReviewInboxRoute() {
  const [mine, setMine] = useState<ReviewInboxQuery['mine']>('assigned');
  const [openOnly, setOpenOnly] = useState(true);
  const inbox = useReviewInbox({ mine, ...(openOnly && { state: 'open' as const }) });
  const label = VIEWS.find((view) => view.value === mine)!.label;

  let body;
  if (inbox.isPending) body = <PageLoader label="Loading review requests" />;
  else if (inbox.isError) body = <ErrorPanel title="The review requests could not be loaded" message={inbox.error.message} onRetry={() => void inbox.refetch()} />;
  else if (inbox.data.length === 0)
    body = (
      <Paper withBorder radius="sm" p="xl">
        <EmptyState icon={<IconChecklist size={28} stroke={1.5} />}>
          <EmptyState.Title order={2}>{openOnly ? 'Nothing waiting' : 'No review requests'}</EmptyState.Title>
          <EmptyState.Description>
            {mine === 'assigned' ? 'When a designer asks you to review a revision, it shows here.' : 'Freeze a sheet and ask for a review from its page.'}
          </EmptyState.Description>
        </EmptyState>
      </Paper>
    );
  else
    body = (
      <Paper withBorder radius="sm" p={0}>
        <ReviewInboxTable requests={inbox.data} label={label} />
      </Paper>
    );

  return (
    <Stack gap={0}>
      <PageHeader title="Reviews" description="Revisions waiting for a senior pair of eyes, and the ones you sent for review." />
      <Group mb="sm" gap="md">
        <SegmentedControl data={[...VIEWS]} value={mine} onChange={(value) => setMine(value as ReviewInboxQuery['mine'])} aria-label="Which requests" />
        <Switch label="Open requests only" checked={openOnly} onChange={(event) => setOpenOnly(event.currentTarget.checked)} />
      </Group>
      {body}
    </Stack>
  );
}
