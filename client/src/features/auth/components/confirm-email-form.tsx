import { confirmEmailRequestSchema } from '@channelwright/shared/schemas';
import { PasswordInput, Text } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { useConfirmEmail } from '../api/confirm-email';
import { AuthForm } from './auth-form';

/** Finishing a sign-up from the mailed link: the link proves the address, the password proves the person. */
export function ConfirmEmailForm({ token }: { token: string }) {
  const confirm = useConfirmEmail();
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { token, password: '' },
    validate: schemaResolver(confirmEmailRequestSchema, { sync: true }),
  });

  const submit = form.onSubmit((values) => confirm.mutate(confirmEmailRequestSchema.parse(values)));

  return (
    <AuthForm
      label="Confirm your account"
      onSubmit={submit}
      submitLabel="Confirm and sign in"
      pending={confirm.isPending}
      error={confirm.error}
      errorTitle="The account was not confirmed"
    >
      <Text size="sm">Enter the password you chose when you signed up to open your new account.</Text>
      <PasswordInput label="Password" autoComplete="current-password" withAsterisk key={form.key('password')} {...form.getInputProps('password')} />
    </AuthForm>
  );
}
