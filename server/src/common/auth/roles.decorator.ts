import type { GlobalRole } from '@channelwright/shared/schemas';
import { SetMetadata } from '@nestjs/common';

export const ROLES_KEY = 'channelwright:roles';

/** Restricts a route (or a whole controller) to users holding one of these global roles. */
export const Roles = (...roles: GlobalRole[]) => SetMetadata(ROLES_KEY, roles);
