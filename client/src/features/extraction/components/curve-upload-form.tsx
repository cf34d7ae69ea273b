import '@mantine/dropzone/styles.css';
import { CURVE_FILE_MAX_BYTES, type Extraction, extractionUploadFieldsSchema } from '@channelwright/shared/schemas';
import { Alert, Button, Group, Select, SegmentedControl, SimpleGrid, Stack, Text } from '@mantine/core';
import { Dropzone } from '@mantine/dropzone';
import { useForm } from '@mantine/form';
import { IconFileUpload } from '@tabler/icons-react';
import { useState } from 'react';
import { ProblemsTable } from '../../../components/problems-table';
import { QuantityInput } from '../../../components/quantity-input';
import { isApiError } from '../../../lib/api-error';
import { useProcessProfiles } from '../../../lib/processes/process-profiles';
import { useCreateExtraction } from '../api/create-extraction';
import { FitModelControl } from './fit-model-control';

interface FormValues {
  processId: string;
  polarity: 'nmos' | 'pmos';
  model: 'all-region' | 'square-law';
  w: string;
  l: string;
  temperature: string;
}

const MAX_MB = CURVE_FILE_MAX_BYTES / 1024 / 1024;
const fieldsSchema = extractionUploadFieldsSchema.pick({ processId: true, polarity: true, model: true, w: true, l: true, temperature: true });
/** Empty fields are absent: the server then reads W, L and T from the file's columns. */
const blankToAbsent = (values: FormValues) => Object.fromEntries(Object.entries(values).filter(([, value]) => value.trim() !== ''));

function validate(values: FormValues): Partial<Record<keyof FormValues, string>> {
  const parsed = fieldsSchema.safeParse(blankToAbsent(values));
  if (parsed.success) return {};
  const errors: Partial<Record<keyof FormValues, string>> = {};
  for (const issue of parsed.error.issues) {
    const field = String(issue.path[0]) as keyof FormValues;
    errors[field] ??= field === 'processId' ? 'Choose the profile the fit starts from' : issue.message;
  }
  return errors;
}

/**
 * The curve file and what goes with it: the base profile (every parameter not fitted comes from it), the polarity,
 * the model to fit, and W, L and the temperature when the file has no such columns. A refused file shows every
 * problem with its row and column.
 */
export function CurveUploadForm({ onStarted }: { onStarted: (extraction: Extraction) => void }) {
  const profiles = useProcessProfiles();
  const create = useCreateExtraction();
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string>();
  const form = useForm<FormValues>({ initialValues: { processId: '', polarity: 'nmos', model: 'all-region', w: '', l: '', temperature: '' }, validate });
  const error = create.error;
  const problems = isApiError(error) ? (error.problems ?? []) : [];

  const submit = form.onSubmit((values) => {
    if (!file) {
      setFileError('Choose the curve file');
      return;
    }
    create.mutate({ file, fields: values }, { onSuccess: onStarted });
  });

  return (
    <form onSubmit={submit} aria-label="Curves to fit" noValidate>
      <Stack gap="md">
        <Dropzone
          onDrop={([dropped]) => {
            setFile(dropped ?? null);
            setFileError(undefined);
            create.reset();
          }}
          onReject={() => setFileError(`Choose one CSV file of at most ${MAX_MB} MB`)}
          accept={{ 'text/csv': ['.csv'], 'text/plain': ['.csv', '.txt'] }}
          maxSize={CURVE_FILE_MAX_BYTES}
          multiple={false}
          inputProps={{ 'aria-label': 'Choose a curve file' }}
        >
          <Group justify="center" gap="md" mih={110} style={{ pointerEvents: 'none' }}>
            <IconFileUpload size={36} stroke={1.4} />
            <Stack gap={2}>
              <Text fw={500}>{file ? file.name : 'Drop a curve file here, or click to choose one'}</Text>
              <Text size="sm" c="dimmed">
                CSV with units in the header, e.g. <Text span ff="monospace">VGS [V],VDS [V],VSB [V],T [°C],ID [uA]</Text>; several curves in one file; up to {MAX_MB} MB.
                A PMOS may be given in either sign convention.
              </Text>
            </Stack>
          </Group>
        </Dropzone>
        {fileError && (
          <Text size="sm" c="red" role="alert">
            {fileError}
          </Text>
        )}
        <SimpleGrid cols={{ base: 1, sm: 3 }}>
          <Select
            label="Base profile"
            description="Everything not fitted comes from its latest version"
            placeholder={profiles.isPending ? 'Loading…' : 'Choose a profile'}
            data={(profiles.data ?? []).map((p) => ({ value: p.id, label: p.name }))}
            searchable
            {...form.getInputProps('processId')}
          />
          <Stack gap={4}>
            <Text size="sm" fw={500} id="extraction-polarity">
              Polarity
            </Text>
            <SegmentedControl aria-labelledby="extraction-polarity" data={[{ value: 'nmos', label: 'NMOS' }, { value: 'pmos', label: 'PMOS' }]} {...form.getInputProps('polarity')} />
          </Stack>
          <FitModelControl id="extraction-model" {...form.getInputProps('model')} />
        </SimpleGrid>
        <SimpleGrid cols={{ base: 1, sm: 3 }}>
          <QuantityInput label="W (when the file has no W column)" unit="m" value={form.values.w} onChange={(text) => form.setFieldValue('w', text)} error={form.errors.w} />
          <QuantityInput label="L (when the file has no L column)" unit="m" value={form.values.l} onChange={(text) => form.setFieldValue('l', text)} error={form.errors.l} />
          <QuantityInput label="Temperature (when the file has no T column)" unit="°C" value={form.values.temperature} onChange={(text) => form.setFieldValue('temperature', text)} error={form.errors.temperature} />
        </SimpleGrid>
        <Group>
          <Button type="submit" loading={create.isPending}>
            Upload and fit
          </Button>
        </Group>
        {problems.length > 0 && (
          <Alert color="red" variant="light" title="The curve file was refused; nothing was stored">
            <ProblemsTable problems={problems} label="Problems in the curve file" fieldHeading="Column" />
          </Alert>
        )}
        {error && problems.length === 0 && (
          <Alert color="red" variant="light" title="Not started">
            {error.message}
          </Alert>
        )}
      </Stack>
    </form>
  );
}
