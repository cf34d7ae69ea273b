import type { Extraction } from '@channelwright/shared/schemas';
import { Alert, Button, Group, Progress, Stack, Text } from '@mantine/core';
import { useCancelExtraction } from '../api/cancel-extraction';

/** A queued or running fit: how far it has come, and a way to stop it. */
export function ExtractionProgress({ extraction }: { extraction: Extraction }) {
  const cancel = useCancelExtraction();
  const { iterations, maxIterations } = extraction.progress;
  const percent = maxIterations > 0 ? Math.min(100, (100 * iterations) / maxIterations) : 0;
  const label = extraction.status === 'queued' ? 'Waiting for a free worker' : `Fitting: ${iterations} of at most ${maxIterations} iterations`;
  return (
    <Alert variant="light" color="blue" title={extraction.status === 'queued' ? 'Queued' : 'Fitting'}>
      <Stack gap="xs">
        <Progress value={percent} animated aria-label="Fit progress" aria-valuetext={label} />
        <Group justify="space-between">
          <Text size="sm">{label}. Most fits stop well before the limit, once they no longer improve.</Text>
          <Button size="xs" variant="default" loading={cancel.isPending} disabled={extraction.cancelRequested} onClick={() => cancel.mutate(extraction.id)}>
            Cancel
          </Button>
        </Group>
      </Stack>
    </Alert>
  );
}
