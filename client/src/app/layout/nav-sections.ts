import type { User } from '@channelwright/shared/schemas';
import { shellRoutes, type NavEntry } from '../routes';

export interface NavItem extends NavEntry {
  path: string;
}

export interface NavSection {
  title: string | null;
  items: NavItem[];
}

const SECTION_TITLES = { work: null, admin: 'Administration' } as const;

/** The navbar's contents for one user: every route with a nav entry that the user may open. */
export function navSectionsFor(user: User): NavSection[] {
  const visible = shellRoutes.filter((route) => route.nav && (!route.access || route.access(user)));
  return (Object.keys(SECTION_TITLES) as (keyof typeof SECTION_TITLES)[])
    .map((section) => ({
      title: SECTION_TITLES[section],
      items: visible
        .filter((route) => (route.nav?.section ?? 'work') === section)
        .map((route) => ({ ...(route.nav as NavEntry), path: route.path })),
    }))
    .filter((section) => section.items.length > 0);
}

/** Whether the page at `pathname` belongs to the nav item at `path`. */
export function isActivePath(path: string, pathname: string): boolean {
  return path === '/' ? pathname === '/' : pathname === path || pathname.startsWith(`${path}/`);
}
