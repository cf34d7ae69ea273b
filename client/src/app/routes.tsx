import { IconHome2, IconUsers, type Icon } from '@tabler/icons-react';
import type { ComponentType } from 'react';
import { isAdmin, type Permission } from '../lib/session/permissions';

/** A lazily loaded page: a module whose default export is the page component. */
export type PageModule = () => Promise<{ default: ComponentType }>;

export interface NavEntry {
  label: string;
  icon: Icon;
  /** 'work' entries sit at the top of the navbar, 'admin' ones under Administration. */
  section?: 'work' | 'admin';
}

export interface ShellRoute {
  path: string;
  page: PageModule;
  /** Who may open the page; others see the not-found page. Default: every signed-in user. */
  access?: Permission;
  /** Present when the page has a navbar entry. */
  nav?: NavEntry;
}

/**
 * Every page inside the signed-in shell, in navbar order. Adding a page (and its nav entry)
 * is one line here; the router and the navbar are both built from this list.
 */
export const shellRoutes: ShellRoute[] = [
  { path: '/', page: () => import('../features/home/routes/home-route'), nav: { label: 'Home', icon: IconHome2 } },
  { path: '/admin/users', page: () => import('../features/users/routes/users-route'), access: isAdmin, nav: { label: 'Users', icon: IconUsers, section: 'admin' } },
];

/** Pages outside the shell, reachable without signing in. */
export const publicRoutes: Pick<ShellRoute, 'path' | 'page'>[] = [
  { path: '/sign-in', page: () => import('../features/auth/routes/sign-in-route') },
  { path: '/sign-up', page: () => import('../features/auth/routes/sign-up-route') },
];
