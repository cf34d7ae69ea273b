import { Alert } from '@mantine/core';
import { IconAlertCircle } from '@tabler/icons-react';
import { isApiError } from '../lib/api-error';

/** The server's refusal, shown inside the form that caused it. */
export function ServerErrorAlert({ title, error }: { title: string; error: unknown }) {
  if (!error) return null;
  const message = isApiError(error) || error instanceof Error ? error.message : 'Something went wrong.';
  return (
    <Alert color="red" variant="light" title={title} icon={<IconAlertCircle size={18} />}>
      {message}
    </Alert>
  );
}
