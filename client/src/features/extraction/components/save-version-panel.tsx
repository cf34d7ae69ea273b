import type { Extraction } from '@channelwright/shared/schemas';
import { Alert, Anchor, Button, Group, Stack, Text, TextInput } from '@mantine/core';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { useSignedInUser } from '../../../lib/session/current-user';
import { canMaintainProcesses } from '../../../lib/session/permissions';
import { useSaveExtraction } from '../api/save-extraction';

/** A finished fit saved as a new version of its base profile: maintainers only; others are told who can. */
export function SaveVersionPanel({ extraction }: { extraction: Extraction }) {
  const user = useSignedInUser();
  const save = useSaveExtraction();
  const [message, setMessage] = useState('');
  const { process, savedAs } = extraction;
  if (savedAs) {
    return (
      <Alert color="teal" variant="light" title="Saved">
        This fit is{' '}
        <Anchor component={Link} to={`/processes/${savedAs.profileId}`}>
          {process.name} version {savedAs.version}
        </Anchor>
        .
      </Alert>
    );
  }
  if (!canMaintainProcesses(user)) {
    return (
      <Text size="sm" c="dimmed">
        A process maintainer can save this fit as a new version of {process.name}.
      </Text>
    );
  }
  const stale = process.latestVersion !== process.version;
  return (
    <Stack gap="xs">
      {stale && (
        <Alert color="orange" variant="light" title={`${process.name} has a newer version`}>
          This fit started from version {process.version}; the profile is at version {process.latestVersion}. Saving is refused: upload the curves again against the latest
          version.
        </Alert>
      )}
      <Group align="flex-end">
        <TextInput label="What the version changes" placeholder="Parameters fitted to measured curves" value={message} onChange={(e) => setMessage(e.currentTarget.value)} w={420} maxLength={400} />
        <Button disabled={stale} loading={save.isPending} onClick={() => save.mutate({ id: extraction.id, request: message.trim() ? { message: message.trim() } : {} })}>
          Save as {process.name} version {process.latestVersion + 1}
        </Button>
      </Group>
      <Text size="xs" c="dimmed">
        The fitted {extraction.polarity.toUpperCase()} parameters replace the base version&apos;s; everything else stays. The extraction is recorded with the version and in the audit.
      </Text>
    </Stack>
  );
}
