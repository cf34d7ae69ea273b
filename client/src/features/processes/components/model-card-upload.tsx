import '@mantine/dropzone/styles.css';
import { cornerNames, MODEL_CARD_MAX_BYTES, type ProcessProfile, type Problem } from '@channelwright/shared/schemas';
import { Alert, Button, Group, Stack, Text, TextInput } from '@mantine/core';
import { Dropzone } from '@mantine/dropzone';
import { IconFileUpload } from '@tabler/icons-react';
import { useState } from 'react';
import { isApiError } from '../../../lib/api-error';
import { useCheckModelCard } from '../api/check-model-card';
import { useImportProcess } from '../api/import-process';
import { CardMappingTables } from './card-mapping-tables';
import { ImportProblemsList } from './import-problems-list';

const CARD_EXTENSIONS = ['.lib', '.l', '.mod', '.model', '.sp', '.spi', '.spice', '.cir', '.txt', '.mdl', '.inc'];
const MAX_MB = MODEL_CARD_MAX_BYTES / 1024 / 1024;

interface ModelCardUploadProps {
  /** The profile as shown; the card becomes the version after its latest. */
  profile: ProcessProfile;
  onUploaded: (profile: ProcessProfile) => void;
}

/** The server's refusal of an upload: a card's problems by line, a mapping's by entry. */
const problemsOf = (error: unknown): Problem[] => (isApiError(error) ? (error.problems ?? []) : []);

/**
 * A SPICE model card as the next version of a profile: checked by the server first (nothing stored), which lists every
 * refused line and shows how the card will be mapped; then uploaded through the import, as a new version.
 */
export function ModelCardUpload({ profile, onUploaded }: ModelCardUploadProps) {
  const [file, setFile] = useState<File>();
  const [message, setMessage] = useState('');
  const check = useCheckModelCard();
  const upload = useImportProcess();
  const nextVersion = profile.latestVersion + 1;
  const checked = check.data;
  const problems: Problem[] = checked ? checked.problems.map((p) => ({ row: p.line, field: p.field, message: p.message })) : problemsOf(upload.error);

  const choose = (files: File[]) => {
    const [chosen] = files;
    if (!chosen) return;
    setFile(chosen);
    upload.reset();
    check.mutate({ file: chosen, profileId: profile.id, version: profile.latestVersion });
  };
  const send = () => {
    if (!file) return;
    const fields = { profileId: profile.id, baseVersion: profile.latestVersion, message: message.trim() || `Model card ${file.name}` };
    upload.mutate({ file, fields }, { onSuccess: onUploaded });
  };

  return (
    <Stack gap="sm">
      <Dropzone
        onDrop={choose}
        accept={{ 'text/plain': CARD_EXTENSIONS, 'application/octet-stream': CARD_EXTENSIONS }}
        maxSize={MODEL_CARD_MAX_BYTES}
        multiple={false}
        loading={check.isPending}
        inputProps={{ 'aria-label': 'Choose a model card file' }}
      >
        <Group justify="center" gap="md" mih={90} style={{ pointerEvents: 'none' }}>
          <IconFileUpload size={36} stroke={1.4} />
          <Stack gap={2}>
            <Text fw={500}>Drop a SPICE model card here, or click to choose one</Text>
            <Text size="sm" c="dimmed">
              .model statements (levels 1–3, BSIM3, BSIM4) in .lib sections, one per corner; up to {MAX_MB} MB. Other statements are refused by line.
            </Text>
          </Stack>
        </Group>
      </Dropzone>
      {file && (
        <Text size="sm">
          Card: <Text span ff="monospace">{file.name}</Text>
        </Text>
      )}
      {check.error && (
        <Alert color="red" variant="light" title="The card could not be checked">
          {check.error.message}
        </Alert>
      )}
      {problems.length > 0 && (
        <Stack gap={4}>
          <Alert color="red" variant="light" title={`${file?.name ?? 'The card'} cannot be used as it is`}>
            {problems.length === 1 ? 'One problem' : `${problems.length} problems`}; nothing was stored. Correct the card and choose it again.
          </Alert>
          <ImportProblemsList problems={problems} caption="Problems in the model card" rowLabel="Line" withField={problems.some((p) => p.field !== undefined && p.field !== 'card')} />
        </Stack>
      )}
      {checked?.card && (
        <Stack gap="xs">
          <Text size="sm">
            {checked.ok
              ? `The card reads cleanly. Its mapping, guessed from the section and model names, is the one stored with v${nextVersion}:`
              : 'The mapping guessed from the section and model names does not fit this process: name the sections after the corners (tt, ff, ss …) and the models after the devices, then choose the card again.'}
          </Text>
          <CardMappingTables card={checked.card} corners={cornerNames(profile.version.definition)} />
        </Stack>
      )}
      {checked?.ok && (
        <Stack gap="xs">
          <TextInput label="What changed" placeholder={`Model card ${file?.name ?? ''}`} value={message} onChange={(event) => setMessage(event.currentTarget.value)} maxLength={500} />
          {upload.error && problemsOf(upload.error).length === 0 && (
            <Alert color="red" variant="light" title="The upload failed">
              {upload.error.message}
            </Alert>
          )}
          <Group justify="flex-end">
            <Button onClick={send} loading={upload.isPending}>
              Save as version {nextVersion}
            </Button>
          </Group>
        </Stack>
      )}
    </Stack>
  );
}
