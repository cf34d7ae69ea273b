import { registerRequestSchema, type RegisterRequest } from '@channelwright/shared/schemas';
import { Alert, PasswordInput, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { isApiError } from '../../../lib/api-error';
import { usePublicConfig } from '../../../lib/public-config';
import { useSignUp } from '../api/sign-up';
import { AuthForm } from './auth-form';

export function SignUpForm() {
  const signUp = useSignUp();
  const config = usePublicConfig();
  const form = useForm<RegisterRequest>({
    mode: 'uncontrolled',
    initialValues: { displayName: '', email: '', password: '' },
    validate: schemaResolver(registerRequestSchema, { sync: true }),
  });

  const submit = form.onSubmit((values) => {
    signUp.mutate(registerRequestSchema.parse(values), {
      // A refusal that names a field (e-mail taken, say) is shown on that field as well.
      onError: (error) => {
        if (isApiError(error) && error.field) form.setFieldError(error.field, error.message);
      },
    });
  });

  if (signUp.data?.status === 'confirmation-sent')
    return (
      <Alert color="teal" variant="light" title="Check your mail" role="status">
        We sent a message to {signUp.data.email}. Open the link in it and enter your password to finish signing up; the link works
        for 24 hours.
        {config.data?.demo && ' This demo server keeps its mail in a local inbox, which the demo administrator reads under Mail.'}
      </Alert>
    );

  return (
    <AuthForm
      label="Create an account"
      onSubmit={submit}
      submitLabel="Create account"
      pending={signUp.isPending}
      error={signUp.error}
      errorTitle="The account was not created"
    >
      <TextInput label="Display name" autoComplete="name" withAsterisk key={form.key('displayName')} {...form.getInputProps('displayName')} />
      <TextInput label="E-mail" type="email" autoComplete="email" withAsterisk key={form.key('email')} {...form.getInputProps('email')} />
      <PasswordInput
        label="Password"
        description="At least 10 characters"
        autoComplete="new-password"
        withAsterisk
        key={form.key('password')}
        {...form.getInputProps('password')}
      />
    </AuthForm>
  );
}
