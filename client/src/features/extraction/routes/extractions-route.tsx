import { Paper, Stack, Text } from '@mantine/core';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '../../../components/page-header';
import { CurveUploadForm } from '../components/curve-upload-form';

/** /extractions: upload measured or simulated curves and start a fit. */
export default function ExtractionsRoute() {
  const navigate = useNavigate();
  return (
    <Stack gap="md">
      <PageHeader title="Fit parameters to curves" description="Upload drain-current curves (ID against VGS) and fit a profile's model parameters to them." />
      <Paper withBorder p="md">
        <CurveUploadForm onStarted={(extraction) => navigate(`/extractions/${extraction.id}`)} />
      </Paper>
      <Text size="sm" c="dimmed">
        The file is kept with the fit, so it can be fitted again and audited. Fitted parameters are estimates: verify with the foundry&apos;s models and sign-off simulation.
      </Text>
    </Stack>
  );
}
