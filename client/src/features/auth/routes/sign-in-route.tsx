import { Anchor, Stack, Text } from '@mantine/core';
import { Link, Navigate, useSearchParams } from 'react-router-dom';
import { usePublicConfig } from '../../../lib/public-config';
import { useAuthToken } from '../../../lib/session/auth-token';
import { AuthLayout } from '../components/auth-layout';
import { ConfirmEmailForm } from '../components/confirm-email-form';
import { DemoAccounts } from '../components/demo-accounts';
import { SignInForm } from '../components/sign-in-form';
import { safeNextPath } from './safe-next-path';

export default function SignInRoute() {
  const token = useAuthToken();
  const [searchParams] = useSearchParams();
  const config = usePublicConfig();
  // Signing in stores the token; this page then steps aside to where the user was going.
  if (token) return <Navigate to={safeNextPath(searchParams.get('next'))} replace />;

  const footer = (
    <Stack gap="md">
      {config.data?.signupEnabled && (
        <Text size="sm" ta="center">
          New to Channelwright?{' '}
          <Anchor component={Link} to="/sign-up">
            Create an account
          </Anchor>
        </Text>
      )}
      {config.data?.demo && <DemoAccounts />}
    </Stack>
  );

  // The link mailed at sign-up lands here with ?confirm=<token>.
  const confirmToken = searchParams.get('confirm');
  if (confirmToken)
    return (
      <AuthLayout title="Confirm your account">
        <ConfirmEmailForm token={confirmToken} />
      </AuthLayout>
    );

  return (
    <AuthLayout title="Sign in" footer={footer}>
      <SignInForm />
    </AuthLayout>
  );
}
