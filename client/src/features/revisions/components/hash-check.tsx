import { Alert, Button, Code, Stack, Text } from '@mantine/core';
import { IconShieldCheck, IconShieldX } from '@tabler/icons-react';
import { useState } from 'react';
import { useVerifyRevision } from '../api/verify-revision';

/** Recomputes the revision's hash on the server and says whether the stored rows still match it. */
export function HashCheck({ revisionId }: { revisionId: string }) {
  const [asked, setAsked] = useState(false);
  const verify = useVerifyRevision(revisionId, asked);
  if (!asked || verify.isPending) {
    return (
      <Button size="xs" variant="default" leftSection={<IconShieldCheck size={14} />} loading={asked && verify.isPending} onClick={() => setAsked(true)}>
        Verify hash
      </Button>
    );
  }
  if (verify.isError) return <Text size="sm" c="red">The hash could not be checked: {verify.error.message}</Text>;
  const { valid, storedHash, computedHash } = verify.data;
  return valid ? (
    <Alert color="green" variant="light" icon={<IconShieldCheck size={16} />} title="Hash verified" role="status">
      The stored snapshot still hashes to <Code>{storedHash.slice(0, 16)}…</Code>: it is exactly what was frozen.
    </Alert>
  ) : (
    <Alert color="red" variant="light" icon={<IconShieldX size={16} />} title="Hash mismatch" role="alert">
      <Stack gap={2}>
        <Text size="sm">The stored rows no longer match the hash they were sealed with.</Text>
        <Text size="xs">
          Stored <Code>{storedHash}</Code>
        </Text>
        <Text size="xs">
          Computed <Code>{computedHash}</Code>
        </Text>
      </Stack>
    </Alert>
  );
}
