import { IconChartDots, IconChecklist, IconCpu, IconHome2, IconMail, IconMailbox, IconRuler2, IconUsers, type Icon } from '@tabler/icons-react';
import type { ComponentType } from 'react';
import { canMaintainProcesses, isAdmin, type Permission } from '../lib/session/permissions';

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
  { path: '/processes', page: () => import('../features/processes/routes/processes-route'), nav: { label: 'Processes', icon: IconCpu } },
  { path: '/processes/new', page: () => import('../features/processes/routes/process-new-route'), access: canMaintainProcesses },
  { path: '/processes/:id', page: () => import('./pages/process-page') },
  { path: '/processes/:id/design-charts', page: () => import('./pages/gm-id-charts-page') },
  { path: '/processes/:id/edit', page: () => import('../features/processes/routes/process-edit-route'), access: canMaintainProcesses },
  { path: '/extractions', page: () => import('../features/extraction/routes/extractions-route'), nav: { label: 'Fit parameters', icon: IconChartDots } },
  { path: '/extractions/:id', page: () => import('../features/extraction/routes/extraction-route') },
  { path: '/workbench', page: () => import('./pages/scratch-device-page'), nav: { label: 'Size a device', icon: IconRuler2 } },
  { path: '/projects/:projectId', page: () => import('../features/projects/routes/project-route') },
  { path: '/sheets/:sheetId', page: () => import('./pages/sheet-page') },
  { path: '/sheets/:sheetId/devices/:deviceId', page: () => import('./pages/device-page') },
  { path: '/reviews', page: () => import('../features/reviews/routes/review-inbox-route'), nav: { label: 'Reviews', icon: IconChecklist } },
  { path: '/revisions/:revisionId', page: () => import('../features/revisions/routes/revision-route') },
  { path: '/revisions/:revisionId/devices/:deviceId', page: () => import('../features/revisions/routes/revision-device-route') },
  { path: '/projects/:projectId/audit', page: () => import('../features/audit/routes/project-audit-route') },
  { path: '/mail', page: () => import('../features/outbox/routes/my-mail-route'), nav: { label: 'My mail', icon: IconMailbox } },
  { path: '/admin/users', page: () => import('../features/users/routes/users-route'), access: isAdmin, nav: { label: 'Users', icon: IconUsers, section: 'admin' } },
  { path: '/admin/mail', page: () => import('../features/outbox/routes/admin-mail-route'), access: isAdmin, nav: { label: 'Mail outbox', icon: IconMail, section: 'admin' } },
];

/** Pages outside the shell, reachable without signing in. */
export const publicRoutes: Pick<ShellRoute, 'path' | 'page'>[] = [
  { path: '/sign-in', page: () => import('../features/auth/routes/sign-in-route') },
  { path: '/sign-up', page: () => import('../features/auth/routes/sign-up-route') },
];
