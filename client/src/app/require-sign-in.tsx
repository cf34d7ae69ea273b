import { Container } from '@mantine/core';
import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { ErrorPanel } from '../components/error-panel';
import { PageLoader } from '../components/page-loader';
import { useAuthToken } from '../lib/session/auth-token';
import { useCurrentUser } from '../lib/session/current-user';
import { signInPath } from './sign-in-path';

/**
 * Renders its children only for a signed-in user; anyone else goes to sign-in and comes back.
 * A rejected token is cleared by the API client, which brings the user here without a token.
 */
export function RequireSignIn({ children }: { children: ReactNode }) {
  const token = useAuthToken();
  const location = useLocation();
  const currentUser = useCurrentUser();
  if (!token) return <Navigate to={signInPath(location.pathname + location.search)} replace />;
  if (currentUser.data) return children;
  if (currentUser.isError) {
    return (
      <Container size="sm" py="xl">
        <ErrorPanel
          title="Your session could not be checked"
          message={currentUser.error.message}
          onRetry={() => void currentUser.refetch()}
        />
      </Container>
    );
  }
  return <PageLoader label="Checking your session" />;
}
