import { loginRequestSchema, type LoginRequest } from '@channelwright/shared/schemas';
import { PasswordInput, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { useSignIn } from '../api/sign-in';
import { AuthForm } from './auth-form';

export function SignInForm() {
  const signIn = useSignIn();
  const form = useForm<LoginRequest>({
    mode: 'uncontrolled',
    initialValues: { email: '', password: '' },
    validate: schemaResolver(loginRequestSchema, { sync: true }),
  });

  const submit = form.onSubmit((values) => signIn.mutate(loginRequestSchema.parse(values)));

  return (
    <AuthForm
      label="Sign in"
      onSubmit={submit}
      submitLabel="Sign in"
      pending={signIn.isPending}
      error={signIn.error}
      errorTitle="Sign-in failed"
    >
      <TextInput label="E-mail" type="email" autoComplete="username" withAsterisk key={form.key('email')} {...form.getInputProps('email')} />
      <PasswordInput label="Password" autoComplete="current-password" withAsterisk key={form.key('password')} {...form.getInputProps('password')} />
    </AuthForm>
  );
}
