import type { ReviewRequest } from '@channelwright/shared/schemas';
import { Alert, Badge, Button, Group, Paper, Stack, Text, Textarea } from '@mantine/core';
import { useState } from 'react';
import { useSignedInUser } from '../../../lib/session/current-user';
import { useDecideReviewRequest } from '../api/decide-review-request';
import { useWithdrawReviewRequest } from '../api/withdraw-review-request';
import { formatDateTime } from '../../../lib/format-date';

const OUTCOME: Record<ReviewRequest['state'], { label: string; color: string }> = {
  open: { label: 'Open', color: 'channel' },
  approved: { label: 'Approved', color: 'green' },
  'changes-requested': { label: 'Changes requested', color: 'oxide' },
  withdrawn: { label: 'Withdrawn', color: 'gray' },
};

/** The reviewer's decision on an open request: approve (signs off) or request changes, with a comment. */
function DecisionForm({ request }: { request: ReviewRequest }) {
  const decide = useDecideReviewRequest();
  const [comment, setComment] = useState('');
  return (
    <Stack gap="xs" component="form" aria-label="Decide the review" onSubmit={(event) => event.preventDefault()}>
      <Textarea label="Decision comment" description="Required to request changes" rows={3} value={comment} onChange={(event) => setComment(event.currentTarget.value)} />
      {decide.error && <Alert color="red" variant="light" title="The decision was not recorded">{decide.error.message}</Alert>}
      <Group gap="xs">
        <Button size="xs" color="green" loading={decide.isPending && decide.variables?.decision.decision === 'approve'} onClick={() => decide.mutate({ requestId: request.id, decision: { decision: 'approve', comment } })}>
          Approve and sign off
        </Button>
        <Button size="xs" variant="default" loading={decide.isPending && decide.variables?.decision.decision === 'request-changes'} onClick={() => decide.mutate({ requestId: request.id, decision: { decision: 'request-changes', comment } })}>
          Request changes
        </Button>
      </Group>
    </Stack>
  );
}

/** The review requests of a revision: who was asked, the outcome, and the actions the signed-in user has. */
export function DecisionPanel({ requests }: { requests: ReviewRequest[] }) {
  const me = useSignedInUser();
  const withdraw = useWithdrawReviewRequest();
  if (requests.length === 0) return <Text size="sm" c="dimmed">Nobody has been asked to review this revision.</Text>;
  return (
    <Stack gap="xs">
      {requests.map((request) => {
        const outcome = OUTCOME[request.state];
        const open = request.state === 'open';
        return (
          <Paper key={request.id} withBorder radius="sm" p="sm" aria-label={`Review request to ${request.reviewer?.displayName ?? 'a reviewer'}`} component="section">
            <Stack gap={6}>
              <Group gap={6}>
                <Text size="sm">
                  {request.requestedBy?.displayName ?? 'Someone'} asked <b>{request.reviewer?.displayName ?? 'a reviewer'}</b>
                </Text>
                <Badge color={outcome.color} variant="light" tt="none">{outcome.label}</Badge>
                <Text size="xs" c="dimmed">{formatDateTime(request.createdAt)}</Text>
              </Group>
              {request.note && <Text size="sm" c="dimmed">Note: {request.note}</Text>}
              {request.decisionComment && <Text size="sm">Decision: {request.decisionComment}</Text>}
              {open && request.reviewer?.id === me.id && <DecisionForm request={request} />}
              {open && request.requestedBy?.id === me.id && (
                <Group>
                  <Button size="xs" variant="subtle" color="gray" loading={withdraw.isPending} onClick={() => withdraw.mutate(request.id)}>
                    Withdraw request
                  </Button>
                </Group>
              )}
            </Stack>
          </Paper>
        );
      })}
    </Stack>
  );
}
