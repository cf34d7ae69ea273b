import { render } from '@testing-library/react';
import type { QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProviders } from '../app/providers';
import { buildRoutes } from '../app/router';
import { createQueryClient } from '../lib/query-client';
import { setAuthToken } from '../lib/session/auth-token';

interface RenderAppOptions {
  /** Start signed in with this token (the fake API decides whom it belongs to). */
  token?: string;
}

/** Renders the whole app, with its real routes and providers, at `path`. */
export function renderApp(path: string, { token }: RenderAppOptions = {}) {
  if (token) setAuthToken(token);
  const queryClient = createQueryClient();
  const router = createMemoryRouter(buildRoutes(), { initialEntries: [path] });
  const view = render(
    <AppProviders queryClient={queryClient} env="test">
      <RouterProvider router={router} />
    </AppProviders>,
  );
  return { ...view, router, queryClient, user: userEvent.setup() };
}

/** Renders one component inside the app's providers (theme, query client, notifications) with a given query client. */
export function renderWithProviders(ui: ReactNode, queryClient: QueryClient) {
  return render(
    <AppProviders queryClient={queryClient} env="test">
      {ui}
    </AppProviders>,
  );
}
