import type { RevisionVerification } from '@channelwright/shared/schemas';
import { Alert, Button, Code, List, Stack, Text } from '@mantine/core';
import { IconRefresh, IconShieldCheck, IconShieldX } from '@tabler/icons-react';
import type { UseQueryResult } from '@tanstack/react-query';

/**
 * The verification the revision page runs on opening: the hash recomputed from the stored rows against the
 * stored hash and against the hash every sign-off approved (as the decision and the audit trail recorded it).
 */
export function HashCheck({ verification }: { verification: UseQueryResult<RevisionVerification, Error> }) {
  if (verification.isPending) return <Text size="sm" c="dimmed" role="status">Checking the stored rows against their hash…</Text>;
  if (verification.isError) return <Text size="sm" c="red">The hash could not be checked: {verification.error.message}</Text>;
  const { valid, storedHash, computedHash, signatures, problems } = verification.data;
  const again = (
    <Button size="compact-xs" variant="subtle" leftSection={<IconRefresh size={12} />} loading={verification.isFetching} onClick={() => void verification.refetch()}>
      Check again
    </Button>
  );
  return valid ? (
    <Alert color="green" variant="light" icon={<IconShieldCheck size={16} />} title="Hash verified" role="status">
      <Stack gap={4} align="flex-start">
        <Text size="sm">
          The stored snapshot still hashes to <Code>{storedHash.slice(0, 16)}…</Code>: it is exactly what was frozen
          {signatures.length > 0 ? ', and what the reviewer signed off (decision and audit trail agree).' : '.'}
        </Text>
        {again}
      </Stack>
    </Alert>
  ) : (
    <Alert color="red" variant="light" icon={<IconShieldX size={16} />} title="Hash mismatch" role="alert">
      <Stack gap={2} align="flex-start">
        <List size="sm">
          {problems.map((problem) => (
            <List.Item key={problem}>{problem}</List.Item>
          ))}
        </List>
        <Text size="xs">
          Stored <Code>{storedHash}</Code>
        </Text>
        <Text size="xs">
          Computed <Code>{computedHash}</Code>
        </Text>
        {signatures.map((signature) => (
          <Text size="xs" key={signature.reviewRequestId}>
            Signed <Code>{signature.signedHash ?? '—'}</Code> · audit trail <Code>{signature.auditedHash ?? '—'}</Code>
          </Text>
        ))}
        {again}
      </Stack>
    </Alert>
  );
}
