import type { Polarity, SizeResponse } from '@channelwright/shared/schemas';
import { Alert, Group, Loader, Paper, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { IconAlertCircle, IconClockHour4 } from '@tabler/icons-react';
import { isApiError } from '../../../lib/api-error';
import { resultGroups } from '../../../lib/results/result-groups';
import { ModelAccuracyNote } from './model-accuracy-note';
import { OperatingSummary } from './operating-summary';
import { ResultGroupTable } from '../../../components/result-group-table';
import { WarningsList } from './warnings-list';

interface ResultsPanelProps {
  result: SizeResponse | undefined;
  polarity: Polarity;
  /** The symbols still to be filled in before anything can be sized. */
  missing: string[];
  /** A field does not read: the result shown is the last valid entry's, greyed. */
  invalid?: boolean;
  error: unknown;
  /** The error is shown beside its field in the form, so here it is only pointed at. */
  errorShownInForm: boolean;
  updating: boolean;
}

function Refusal({ error, shownInForm }: { error: unknown; shownInForm: boolean }) {
  const message = isApiError(error) || error instanceof Error ? error.message : 'The device could not be sized.';
  if (isApiError(error) && (error.code === 'TABLE_NOT_READY' || error.code === 'TABLE_NOT_CHARACTERISED')) {
    const waiting = error.code === 'TABLE_NOT_READY';
    return (
      <Alert color={waiting ? 'blue' : 'orange'} variant="light" icon={<IconClockHour4 size={18} />} title={waiting ? 'Waiting for a table' : 'No table for this device'} role="status">
        <Text size="sm">
          {message}
          {waiting ? ' The device is sized as soon as the characterisation finishes.' : ' Choose an analytic model, or ask a process maintainer to characterise the model card.'}
        </Text>
      </Alert>
    );
  }
  return (
    <Alert color="red" variant="light" icon={<IconAlertCircle size={18} />} title="This device cannot be sized as asked" role="alert">
      <Text size="sm">{shownInForm ? `${message} (see the highlighted field)` : message}</Text>
    </Alert>
  );
}

/** The sized device: summary, cautions, then every figure in its group, each with its unit. */
export function ResultsPanel({ result, polarity, missing, invalid = false, error, errorShownInForm, updating }: ResultsPanelProps) {
  const outdated = Boolean(error) || missing.length > 0 || invalid;
  return (
    <Stack gap="sm" aria-label="Results" role="region">
      <Group justify="space-between" align="center" h={24}>
        <Title order={2} fz="md">
          Results
        </Title>
        {updating && (
          <Group gap={6} role="status" aria-label="Updating results">
            <Loader size={14} />
            <Text size="xs" c="dimmed">
              updating
            </Text>
          </Group>
        )}
      </Group>
      {missing.length > 0 && (
        <Text size="sm" c="dimmed">
          Enter {missing.join(', ')} to size the device.
        </Text>
      )}
      {error ? <Refusal error={error} shownInForm={errorShownInForm} /> : null}
      {invalid && !error && (
        <Text size="sm" c="dimmed" role="status">
          Correct the highlighted field{result ? ': the results below are for the last valid entry' : ''}.
        </Text>
      )}
      {result && (
        <Stack gap="sm" style={{ opacity: outdated ? 0.45 : 1 }} aria-disabled={outdated} data-outdated={outdated}>
          <Paper withBorder radius="sm" p="sm">
            <Stack gap="sm">
              <OperatingSummary result={result} />
              <ModelAccuracyNote result={result} />
              <WarningsList warnings={result.warnings} fromTables={result.model === 'table'} />
            </Stack>
          </Paper>
          <SimpleGrid cols={{ base: 1, md: 2, xl: 3 }} spacing="xs" verticalSpacing="xs">
            {resultGroups(result, polarity).map((group) => (
              <ResultGroupTable key={group.title} group={group} />
            ))}
          </SimpleGrid>
        </Stack>
      )}
    </Stack>
  );
}
