import '@mantine/dropzone/styles.css';
import { PROCESS_IMPORT_MAX_BYTES, type ProcessProfile } from '@channelwright/shared/schemas';
import { Alert, Grid, Group, Stack, Text } from '@mantine/core';
import { Dropzone, type FileRejection } from '@mantine/dropzone';
import { IconFileUpload, IconFileX } from '@tabler/icons-react';
import { useState } from 'react';
import { isApiError } from '../../../lib/api-error';
import { useImportProcess } from '../api/import-process';
import { ImportProblemsList } from './import-problems-list';

interface ImportProcessPanelProps {
  /** Import as a new version of this profile, edited from this version; a new profile when absent. */
  target?: { profileId: string; baseVersion: number };
  onImported: (profile: ProcessProfile) => void;
}

const ACCEPT = { 'text/csv': ['.csv'], 'application/json': ['.json'], 'text/plain': ['.csv'] };
const MAX_MB = PROCESS_IMPORT_MAX_BYTES / 1024 / 1024;

function rejectionText(rejections: FileRejection[]): string {
  const first = rejections[0];
  if (!first) return 'The file was not accepted.';
  if (first.errors.some((e) => e.code === 'file-too-large')) return `${first.file.name} is larger than ${MAX_MB} MB.`;
  if (first.errors.some((e) => e.code === 'file-invalid-type')) return `${first.file.name} is not a .csv or .json file.`;
  return first.errors.map((e) => e.message).join(' ');
}

/** Drop or pick a CSV or JSON process file; a refused file shows its problems by row and field beside it. */
export function ImportProcessPanel({ target, onImported }: ImportProcessPanelProps) {
  const importProcess = useImportProcess();
  const [fileName, setFileName] = useState<string>();
  const [rejected, setRejected] = useState<string>();
  const error = importProcess.error;
  const problems = isApiError(error) ? (error.problems ?? []) : [];

  const upload = (files: File[]) => {
    const [file] = files;
    if (!file) return;
    setRejected(undefined);
    setFileName(file.name);
    importProcess.mutate({ file, fields: target ?? {} }, { onSuccess: onImported });
  };

  return (
    <Grid gap="lg">
      <Grid.Col span={{ base: 12, md: problems.length > 0 ? 5 : 12 }}>
        <Stack gap="sm">
          <Dropzone
            onDrop={upload}
            onReject={(rejections) => setRejected(rejectionText(rejections))}
            accept={ACCEPT}
            maxSize={PROCESS_IMPORT_MAX_BYTES}
            multiple={false}
            loading={importProcess.isPending}
            inputProps={{ 'aria-label': 'Choose a process file' }}
          >
            <Group justify="center" gap="md" mih={120} style={{ pointerEvents: 'none' }}>
              <Dropzone.Reject>
                <IconFileX size={40} stroke={1.4} />
              </Dropzone.Reject>
              <Dropzone.Idle>
                <IconFileUpload size={40} stroke={1.4} />
              </Dropzone.Idle>
              <Stack gap={2}>
                <Text fw={500}>Drop a process file here, or click to choose one</Text>
                <Text size="sm" c="dimmed">
                  CSV (parameter,polarity,value,unit) or Channelwright JSON, up to {MAX_MB} MB. Any problem refuses the whole file.
                </Text>
              </Stack>
            </Group>
          </Dropzone>
          {fileName && (
            <Text size="sm">
              File: <Text span ff="monospace">{fileName}</Text>
              {importProcess.isSuccess && ' — imported'}
            </Text>
          )}
          {rejected && (
            <Alert color="red" variant="light">
              {rejected}
            </Alert>
          )}
          {error && (
            <Alert color="red" variant="light" title={problems.length > 0 ? `${fileName ?? 'The file'} was refused` : 'The import failed'}>
              {error.message}
            </Alert>
          )}
        </Stack>
      </Grid.Col>
      {problems.length > 0 && (
        <Grid.Col span={{ base: 12, md: 7 }}>
          <ImportProblemsList problems={problems} />
        </Grid.Col>
      )}
    </Grid>
  );
}
