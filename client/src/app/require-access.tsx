import type { ReactNode } from 'react';
import { NotFoundPage } from '../components/not-found-page';
import { useSignedInUser } from '../lib/session/current-user';
import type { Permission } from '../lib/session/permissions';

/** Shows the page only to users the permission allows; others get the not-found page. */
export function RequireAccess({ allow, children }: { allow: Permission; children: ReactNode }) {
  const user = useSignedInUser();
  return allow(user) ? children : <NotFoundPage />;
}
