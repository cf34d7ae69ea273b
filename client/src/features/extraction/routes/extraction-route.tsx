import { MODEL_LABELS } from '@channelwright/shared/schemas';
import { Alert, Anchor, Badge, Group, List, Paper, Stack, Text, Title } from '@mantine/core';
import { Link, useParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { RegionErrorBoundary } from '../../../components/region-error-boundary';
import { useExtractionCurves } from '../api/get-extraction-curves';
import { isRunning, useExtraction } from '../api/get-extraction';
import { ExtractionProgress } from '../components/extraction-progress';
import { FitCharts } from '../components/fit-charts';
import { ParameterReport } from '../components/parameter-report';
import { SaveVersionPanel } from '../components/save-version-panel';

/** /extractions/:id: a fit's progress, then its report, the charts of data against fit, and saving it. */
export default function ExtractionRoute() {
  const { id = '' } = useParams();
  const extraction = useExtraction(id);
  const done = extraction.data?.status === 'done';
  const curves = useExtractionCurves(id, done);
  if (extraction.isPending) return <PageLoader label="Loading the extraction" />;
  if (extraction.isError) return <ErrorPanel title="This extraction could not be loaded" message={extraction.error.message} onRetry={() => void extraction.refetch()} />;
  const job = extraction.data;
  const source = job.source;
  const table = source.table;
  const tableName = table ? `the ${table.corner} lines of the ${table.polarity.toUpperCase()}${table.flavour ? ` ${table.flavour}` : ''} table of ${table.processName} version ${table.version}` : null;
  return (
    <Stack gap="md">
      <PageHeader
        title={tableName ? `Fit of ${tableName}` : `Fit of ${source.fileName}`}
        description={
          <>
            {job.polarity.toUpperCase()} on {job.process.name} version {job.process.version}, {MODEL_LABELS[job.options.model]}; {source.points} points in {source.curves.length} curves.{' '}
            <Anchor component={Link} to="/extractions">
              Fit other curves
            </Anchor>
          </>
        }
        actions={<Badge size="lg" variant="light" color={done ? 'teal' : isRunning(job) ? 'blue' : 'red'}>{job.status}</Badge>}
      />
      {source.notes.length > 0 && (
        <Alert variant="light" color="gray" title="How the file was read">
          <List size="sm">
            {source.convention === 'negative' && <List.Item>PMOS given in the simulator&apos;s negative signs (VGS, VDS ≤ 0, ID &lt; 0): turned into VSG, VSD and the source-to-drain current.</List.Item>}
            {source.notes.map((note) => (
              <List.Item key={note}>{note}</List.Item>
            ))}
          </List>
        </Alert>
      )}
      {isRunning(job) && <ExtractionProgress extraction={job} />}
      {job.error && (
        <Alert color={job.status === 'cancelled' ? 'gray' : 'red'} variant="light" title={job.status === 'cancelled' ? 'Cancelled' : 'The fit failed'}>
          {job.error.message}
        </Alert>
      )}
      {job.result && (
        <>
          <Paper withBorder p="md">
            <Stack gap="sm">
              <Title order={2} fz="lg">
                Parameters
              </Title>
              <ParameterReport result={job.result} />
            </Stack>
          </Paper>
          <Paper withBorder p="md">
            <Stack gap="sm">
              <Title order={2} fz="lg">
                Data against fit
              </Title>
              <RegionErrorBoundary region="the charts">
                {curves.data ? <FitCharts curves={curves.data.curves} /> : curves.isError ? <Text size="sm" c="red">The curves could not be loaded.</Text> : <PageLoader label="Loading the curves" />}
              </RegionErrorBoundary>
            </Stack>
          </Paper>
          <Paper withBorder p="md">
            <Stack gap="sm">
              <Title order={2} fz="lg">
                Save as a profile version
              </Title>
              <SaveVersionPanel extraction={job} />
            </Stack>
          </Paper>
        </>
      )}
      <Group>
        <Text size="xs" c="dimmed">
          {table ? `Points of the characterised table ${table.tableId} (card model ${table.model}, table SHA-256 ${table.sha256.slice(0, 12)}…) kept as ${source.fileName}` : `Upload ${source.fileName}`} ({source.bytes}{' '}
          bytes, SHA-256 {source.sha256.slice(0, 12)}…) is kept with this fit. Estimates: verify with the foundry&apos;s models and sign-off simulation.
        </Text>
      </Group>
    </Stack>
  );
}
