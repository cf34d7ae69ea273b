import type { Revision } from '@channelwright/shared/schemas';
import { Alert, Code, Group, Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconAlertOctagon, IconLock, IconRosetteDiscountCheck } from '@tabler/icons-react';
import { useVerifyRevision } from '../api/verify-revision';
import { HashCheck } from './hash-check';
import { formatDateTime } from '../../../lib/format-date';

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <Stack gap={0}>
      <Text size="xs" c="dimmed">
        {label}
      </Text>
      <Text size="sm" component="div">
        {children}
      </Text>
    </Stack>
  );
}

/**
 * What was frozen, by whom, on which numbers, its hash, and the sign-off when there is one. The hash is
 * verified on opening; a sign-off whose revision fails verification is flagged, never shown as holding.
 */
export function RevisionSummary({ revision }: { revision: Revision }) {
  const verification = useVerifyRevision(revision.id, true);
  const broken = verification.data?.valid === false;
  const signOff = revision.signOff;
  return (
    <Stack gap="sm">
      <Paper withBorder radius="sm" p="sm">
        <SimpleGrid cols={{ base: 2, md: 4 }} spacing="sm">
          <Fact label="Frozen by">{revision.author?.displayName ?? '—'}</Fact>
          <Fact label="Frozen on">{formatDateTime(revision.createdAt)}</Fact>
          <Fact label="Process">
            {revision.process.name} v{revision.process.version}
          </Fact>
          <Fact label="Engine">{revision.engineVersion}</Fact>
          <Fact label="Sheet defaults">
            {revision.sheet.corner}, {revision.sheet.temperature === null ? 'process tnom' : `${revision.sheet.temperature} °C`}, {revision.sheet.model}
          </Fact>
          <Fact label="Devices">{revision.deviceCount}</Fact>
          <Fact label="SHA-256">
            <Code title={revision.hash}>{revision.hash.slice(0, 16)}…</Code>
          </Fact>
        </SimpleGrid>
      </Paper>
      {signOff && broken ? (
        <Alert color="red" variant="filled" icon={<IconAlertOctagon size={18} />} title="Sign-off does not hold: this revision failed verification" role="alert">
          <Text size="sm">
            {signOff.by?.displayName ?? 'A reviewer'} signed off hash <Code>{signOff.hash.slice(0, 16)}…</Code>, but the stored rows no longer match it. Treat this revision
            as unsigned and tell an administrator.
          </Text>
        </Alert>
      ) : signOff ? (
        <Alert color="green" variant="light" icon={<IconRosetteDiscountCheck size={18} />} title={`Signed off by ${signOff.by?.displayName ?? 'a reviewer'}`}>
          <Stack gap={4}>
            <Text size="sm">
              On {formatDateTime(signOff.at)}, with hash <Code>{signOff.hash.slice(0, 16)}…</Code>. This revision can never change; edit the sheet and freeze a new revision
              for further work.
            </Text>
          </Stack>
        </Alert>
      ) : (
        <Group gap={6}>
          <IconLock size={14} />
          <Text size="sm" c="dimmed">
            A frozen snapshot: it never changes. Edit the sheet and freeze a new revision to change anything.
          </Text>
        </Group>
      )}
      <Group>
        <HashCheck verification={verification} />
      </Group>
    </Stack>
  );
}
