import type { CharacterisationJob } from '@channelwright/shared/schemas';
import { Alert, Badge, Button, Group, Progress, Stack, Text } from '@mantine/core';
import { etaWords, isUnderway, percentDone, STATUS_COLORS, STATUS_WORDS } from '../model/job-status';

interface JobProgressProps {
  job: CharacterisationJob;
  /** Present for maintainers while the job is under way. */
  onCancel?: () => void;
  cancelling?: boolean;
}

const when = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

const ENGINE_WORDS = { native: 'ngspice (native)', wasm: 'ngspice (WebAssembly)' } as const;

/** One job: its state, a progress bar with points done of all and the estimate, and why it failed. */
export function JobProgress({ job, onCancel, cancelling }: JobProgressProps) {
  const percent = percentDone(job.progress);
  const underway = isUnderway(job.status);
  const eta = etaWords(job.etaSeconds);
  return (
    <Stack gap={6} aria-label="Characterisation" role="group">
      <Group justify="space-between" align="center" gap="xs">
        <Group gap="xs">
          <Badge color={STATUS_COLORS[job.status]} variant="light" radius="sm" tt="none" aria-label="Characterisation status">
            {job.cancelRequested && underway ? 'cancelling' : STATUS_WORDS[job.status]}
          </Badge>
          <Text size="xs" c="dimmed">
            asked by {job.requestedBy?.displayName ?? 'the system'}, {when.format(new Date(job.createdAt))}
            {job.engine && ` · ${ENGINE_WORDS[job.engine]}`}
            {job.attempts > 1 && ` · run ${job.attempts} (resumed after a server stop)`}
          </Text>
        </Group>
        {onCancel && underway && (
          <Button size="compact-sm" variant="light" color="red" onClick={onCancel} loading={cancelling} disabled={job.cancelRequested}>
            Cancel
          </Button>
        )}
      </Group>
      <Progress
        value={job.status === 'done' ? 100 : percent}
        color={STATUS_COLORS[job.status]}
        striped={underway}
        animated={job.status === 'running'}
        size="lg"
        aria-label="Characterisation progress"
      />
      <Group justify="space-between" gap="xs">
        <Text size="sm" style={{ fontVariantNumeric: 'tabular-nums' }} aria-label="Points simulated">
          {job.progress.done.toLocaleString('en')} of {job.progress.total.toLocaleString('en')} points ({job.status === 'done' ? 100 : percent} %)
        </Text>
        {underway && (
          <Text size="sm" c="dimmed" aria-label="Time to go">
            {eta ?? (job.status === 'queued' ? 'waiting for a free simulator' : 'estimating the time to go…')}
          </Text>
        )}
      </Group>
      {job.status === 'failed' && job.error && (
        <Alert color="red" variant="light" title="The characterisation failed; nothing of it was kept">
          <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>
            {job.error.message}
          </Text>
        </Alert>
      )}
      {job.status === 'cancelled' && (
        <Text size="sm" c="dimmed">
          Cancelled{job.error ? `: ${job.error.message}` : ''}. Nothing of it was kept.
        </Text>
      )}
    </Stack>
  );
}
