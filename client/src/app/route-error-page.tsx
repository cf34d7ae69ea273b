import { Container } from '@mantine/core';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { ErrorPanel } from '../components/error-panel';
import { NotFoundPage } from '../components/not-found-page';

/** The last resort for errors no region caught (for example a page bundle that failed to load). */
export function RouteErrorPage() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundPage />;
  const message = error instanceof Error ? error.message : 'An unexpected error occurred.';
  return (
    <Container size="sm" py="xl">
      <ErrorPanel
        title="Channelwright could not show this page"
        message={message}
        retryLabel="Reload the page"
        onRetry={() => window.location.reload()}
      />
    </Container>
  );
}
