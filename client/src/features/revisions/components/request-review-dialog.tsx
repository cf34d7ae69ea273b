import { createReviewRequestSchema } from '@channelwright/shared/schemas';
import { Alert, Button, Group, Modal, Stack, Textarea } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { useCreateReviewRequest } from '../api/create-review-request';
import { ReviewerSelect } from './reviewer-select';

interface RequestReviewDialogProps {
  revisionId: string;
  label: string;
  projectId: string;
  opened: boolean;
  onClose: () => void;
}

/** Asks a reviewer to review an already frozen revision (a draft: never requested, or withdrawn). */
export function RequestReviewDialog({ revisionId, label, projectId, opened, onClose }: RequestReviewDialogProps) {
  const request = useCreateReviewRequest();
  const [reviewerId, setReviewerId] = useState<string | null>(null);
  const [note, setNote] = useState('');
  const [missing, setMissing] = useState(false);

  const close = () => {
    request.reset();
    setReviewerId(null);
    setNote('');
    setMissing(false);
    onClose();
  };
  const send = () => {
    if (!reviewerId) return setMissing(true);
    request.mutate(
      { revisionId, request: createReviewRequestSchema.parse({ reviewerId, note }) },
      { onSuccess: (sent) => (notifications.show({ color: 'channel', message: `${label} sent to ${sent.reviewer?.displayName ?? 'the reviewer'} for review` }), close()) },
    );
  };

  return (
    <Modal opened={opened} onClose={close} title={`Request a review of ${label}`} size="md" centered>
      <Stack gap="sm">
        <ReviewerSelect projectId={projectId} value={reviewerId} onChange={(id) => (setReviewerId(id), setMissing(false))} error={missing ? 'Choose who reviews it' : undefined} />
        <Textarea label="Note to the reviewer" rows={3} value={note} onChange={(event) => setNote(event.currentTarget.value)} />
        {request.error && (
          <Alert color="red" variant="light" title="The review was not requested">
            {request.error.message}
          </Alert>
        )}
        <Group justify="flex-end" gap="xs">
          <Button variant="default" size="xs" onClick={close}>
            Cancel
          </Button>
          <Button size="xs" loading={request.isPending} onClick={send}>
            Request review
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
