import type { Revision } from '@channelwright/shared/schemas';
import { Alert, Button, Checkbox, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { useCreateReviewRequest } from '../api/create-review-request';
import { useCreateRevision } from '../api/create-revision';
import { freezeFormSchema, reviewRequestOf, type FreezeFormValues } from '../model/freeze-form';
import { ReviewerSelect } from './reviewer-select';

interface FreezeDialogProps {
  sheetId: string;
  projectId: string;
  sheetName: string;
  opened: boolean;
  onClose: () => void;
}

/**
 * Freezes the sheet into its next revision and, unless unticked, asks a reviewer at once. If the
 * request fails the revision stays frozen as a draft, and the panel offers the request again.
 */
export function FreezeDialog({ sheetId, projectId, sheetName, opened, onClose }: FreezeDialogProps) {
  const freeze = useCreateRevision();
  const request = useCreateReviewRequest();
  const form = useForm<FreezeFormValues>({
    mode: 'controlled',
    initialValues: { message: '', askReview: true, reviewerId: null, note: '' },
    validate: schemaResolver(freezeFormSchema, { sync: true }),
  });
  // Once frozen, a retry only asks for the review again: it never freezes a second revision.
  const [frozen, setFrozen] = useState<Revision | null>(null);
  const error = freeze.error ?? request.error;

  const close = () => {
    form.reset();
    setFrozen(null);
    freeze.reset();
    request.reset();
    onClose();
  };

  const submit = form.onSubmit(async (values) => {
    const revision = frozen ?? (await freeze.mutateAsync({ sheetId, message: values.message.trim() }).catch(() => null));
    if (!revision) return;
    setFrozen(revision);
    if (!values.askReview) {
      notifications.show({ color: 'channel', message: `${sheetName} frozen as ${revision.label}` });
      close();
      return;
    }
    const sent = await request.mutateAsync({ revisionId: revision.id, request: reviewRequestOf(values) }).catch(() => null);
    if (!sent) return; // the error shows in the dialog; the revision itself is stored
    notifications.show({ color: 'channel', message: `${sheetName} frozen as ${revision.label} and sent to ${sent.reviewer?.displayName ?? 'the reviewer'} for review` });
    close();
  });

  return (
    <Modal opened={opened} onClose={close} title={`Freeze ${sheetName}`} size="md" centered>
      <form onSubmit={submit} aria-label="Freeze the sheet">
        <Stack gap="sm">
          <Text size="sm" c="dimmed">
            A revision is a snapshot of every device's targets and results with the process and engine version, sealed with a
            SHA-256 hash. It never changes; the sheet stays editable.
          </Text>
          <Textarea label="What this revision is" placeholder="e.g. Input pair at gm/ID = 16, tail at 20 µA" rows={3} withAsterisk key={form.key('message')} {...form.getInputProps('message')} />
          <Checkbox label="Ask for a review now" key={form.key('askReview')} {...form.getInputProps('askReview', { type: 'checkbox' })} />
          {form.values.askReview && (
            <>
              <ReviewerSelect projectId={projectId} value={form.values.reviewerId} onChange={(id) => form.setFieldValue('reviewerId', id)} error={form.errors.reviewerId as string | undefined} />
              <Textarea label="Note to the reviewer" rows={3} key={form.key('note')} {...form.getInputProps('note')} />
            </>
          )}
          {error && (
            <Alert color="red" variant="light" title={frozen ? `Frozen as ${frozen.label}, but the review was not requested` : 'The sheet was not frozen'}>
              {error.message}
            </Alert>
          )}
          <Group justify="flex-end" gap="xs">
            <Button variant="default" size="xs" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" size="xs" loading={freeze.isPending || request.isPending}>
              {frozen ? 'Request review' : form.values.askReview ? 'Freeze and request review' : 'Freeze'}
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
