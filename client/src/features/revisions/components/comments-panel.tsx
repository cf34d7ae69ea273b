import type { RevisionDevice } from '@channelwright/shared/schemas';
import { Alert, Badge, Button, Group, Paper, Select, Stack, Text, Textarea } from '@mantine/core';
import { useAddRevisionComment } from '../api/add-revision-comment';
import { useRevisionComments } from '../api/get-revision-comments';
import { formatDateTime } from '../../../lib/format-date';

const WHOLE = '';

interface CommentsPanelProps {
  revisionId: string;
  devices: RevisionDevice[];
  /** Whether the signed-in user may comment (owners, designers, reviewers). */
  canComment: boolean;
  /** The device the form is on ('' for the whole revision), chosen here or from the device table. */
  target: string;
  onTargetChange: (deviceId: string) => void;
  body: string;
  onBodyChange: (body: string) => void;
}

/** The discussion of a revision: comments on the whole of it or on one device, oldest first, and a form. */
export function CommentsPanel({ revisionId, devices, canComment, target, onTargetChange, body, onBodyChange }: CommentsPanelProps) {
  const comments = useRevisionComments(revisionId);
  const add = useAddRevisionComment();
  const send = () =>
    add.mutate(
      { revisionId, comment: { body: body.trim(), ...(target !== WHOLE && { deviceId: target }) } },
      { onSuccess: () => onBodyChange('') },
    );

  return (
    <Stack gap="sm">
      {comments.isError && <Text size="sm" c="red">The comments could not be loaded: {comments.error.message}</Text>}
      {comments.data?.length === 0 && <Text size="sm" c="dimmed">No comments yet.</Text>}
      <Stack gap="xs" role="list" aria-label="Comments">
        {(comments.data ?? []).map((comment) => (
          <Paper key={comment.id} withBorder radius="sm" p="xs" role="listitem">
            <Group gap={6} mb={2}>
              <Text size="sm" fw={600}>{comment.author?.displayName ?? 'someone'}</Text>
              <Badge size="sm" variant="outline" color="gray" tt="none">{comment.device ? comment.device.name : 'whole revision'}</Badge>
              <Text size="xs" c="dimmed">{formatDateTime(comment.createdAt)}</Text>
            </Group>
            <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>{comment.body}</Text>
          </Paper>
        ))}
      </Stack>
      {canComment && (
        <Stack gap="xs" component="form" aria-label="Add a comment" onSubmit={(event) => (event.preventDefault(), send())}>
          <Select
            label="On"
            data={[{ value: WHOLE, label: 'The whole revision' }, ...devices.map((d) => ({ value: d.id, label: d.name }))]}
            value={target}
            onChange={(value) => onTargetChange(value ?? WHOLE)}
            allowDeselect={false}
            w={240}
          />
          <Textarea label="Comment" rows={3} value={body} onChange={(event) => onBodyChange(event.currentTarget.value)} />
          {add.error && <Alert color="red" variant="light">{add.error.message}</Alert>}
          <Group>
            <Button type="submit" size="xs" variant="default" loading={add.isPending} disabled={body.trim() === ''}>
              Add comment
            </Button>
          </Group>
        </Stack>
      )}
    </Stack>
  );
}
