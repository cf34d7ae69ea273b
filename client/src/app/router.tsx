import { lazy, Suspense } from 'react';
import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { NotFoundPage } from '../components/not-found-page';
import { PageLoader } from '../components/page-loader';
import { AppLayout } from './layout/app-layout';
import { RequireAccess } from './require-access';
import { RequireSignIn } from './require-sign-in';
import { RouteErrorPage } from './route-error-page';
import { publicRoutes, shellRoutes, type ShellRoute } from './routes';

function shellRoute({ path, page, access }: ShellRoute): RouteObject {
  const Page = lazy(page);
  const element = access ? <RequireAccess allow={access}><Page /></RequireAccess> : <Page />;
  return path === '/' ? { index: true, element } : { path, element };
}

function publicRoute({ path, page }: Pick<ShellRoute, 'path' | 'page'>): RouteObject {
  const Page = lazy(page);
  return { path, element: <Suspense fallback={<PageLoader />}><Page /></Suspense> };
}

/** The route tree: public pages, then the signed-in shell with its pages and a not-found page. */
export function buildRoutes(): RouteObject[] {
  return [
    {
      errorElement: <RouteErrorPage />,
      children: [
        ...publicRoutes.map(publicRoute),
        {
          path: '/',
          element: <RequireSignIn><AppLayout /></RequireSignIn>,
          children: [...shellRoutes.map(shellRoute), { path: '*', element: <NotFoundPage /> }],
        },
      ],
    },
  ];
}

export const createAppRouter = () => createBrowserRouter(buildRoutes());
