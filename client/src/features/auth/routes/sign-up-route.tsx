import { Alert, Anchor, Text } from '@mantine/core';
import { Link, Navigate } from 'react-router-dom';
import { PageLoader } from '../../../components/page-loader';
import { usePublicConfig } from '../../../lib/public-config';
import { useAuthToken } from '../../../lib/session/auth-token';
import { AuthLayout } from '../components/auth-layout';
import { SignUpForm } from '../components/sign-up-form';

export default function SignUpRoute() {
  const token = useAuthToken();
  const config = usePublicConfig();
  if (token) return <Navigate to="/" replace />;

  const footer = (
    <Text size="sm" ta="center">
      Already have an account?{' '}
      <Anchor component={Link} to="/sign-in">
        Sign in
      </Anchor>
    </Text>
  );

  let body;
  if (config.isPending) body = <PageLoader />;
  else if (config.data?.signupEnabled) body = <SignUpForm />;
  else
    body = (
      <Alert color="gray" variant="light" title="Sign-up is turned off">
        Accounts on this installation are created by an administrator. Ask yours for one.
      </Alert>
    );

  return (
    <AuthLayout title="Create an account" footer={footer}>
      {body}
    </AuthLayout>
  );
}
