import { Paper, SegmentedControl, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '../../../components/page-header';
import { CurveUploadForm } from '../components/curve-upload-form';
import { TableSourceForm } from '../components/table-source-form';

type Source = 'upload' | 'table';

/** /extractions: fit a profile's parameters to uploaded curves, or to a version's characterised table, and start the fit. */
export default function ExtractionsRoute() {
  const navigate = useNavigate();
  const [source, setSource] = useState<Source>('upload');
  const opened = (extraction: { id: string }) => void navigate(`/extractions/${extraction.id}`);
  return (
    <Stack gap="md">
      <PageHeader title="Fit parameters to curves" description="Fit a profile's model parameters to drain-current curves (ID against VGS): uploaded, or read from a version's characterised table." />
      <SegmentedControl
        aria-label="Points to fit"
        w="fit-content"
        value={source}
        onChange={(value) => setSource(value as Source)}
        data={[
          { value: 'upload', label: 'Upload curves' },
          { value: 'table', label: 'From characterised tables' },
        ]}
      />
      <Paper withBorder p="md">
        {source === 'upload' ? <CurveUploadForm onStarted={opened} /> : <TableSourceForm onStarted={opened} />}
      </Paper>
      <Text size="sm" c="dimmed">
        The points are kept with the fit (a table&apos;s as a file naming the table and its hash), so it can be fitted again and audited. Fitted parameters are estimates: verify with the
        foundry&apos;s models and sign-off simulation.
      </Text>
    </Stack>
  );
}
