import { Button, Stack } from '@mantine/core';
import type { FormEventHandler, ReactNode } from 'react';
import { ServerErrorAlert } from '../../../components/server-error-alert';

interface AuthFormProps {
  /** The form's accessible name. */
  label: string;
  onSubmit: FormEventHandler<HTMLFormElement>;
  submitLabel: string;
  pending: boolean;
  /** The server's refusal, shown above the fields under `errorTitle`. */
  error: unknown;
  errorTitle: string;
  children: ReactNode;
}

/** The frame both auth forms share: refusal on top, the fields, one full-width submit button. */
export function AuthForm({ label, onSubmit, submitLabel, pending, error, errorTitle, children }: AuthFormProps) {
  return (
    <form onSubmit={onSubmit} noValidate aria-label={label}>
      <Stack gap="md">
        <ServerErrorAlert title={errorTitle} error={error} />
        {children}
        <Button type="submit" loading={pending} fullWidth mt="xs">
          {submitLabel}
        </Button>
      </Stack>
    </form>
  );
}
