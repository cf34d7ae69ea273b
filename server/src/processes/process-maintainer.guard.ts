import { Injectable, UseGuards, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { forbidden } from '../common/errors/domain-error.js';
import type { Account } from '../users/users.service.js';

/** Admins, and the users an admin marked as process maintainers, may change the library. */
export function isProcessMaintainer(user: Pick<Account, 'role' | 'processMaintainer'> | undefined): boolean {
  return user !== undefined && (user.role === 'admin' || user.processMaintainer);
}

/** The one place the library's write rule is enforced: 403 NOT_PROCESS_MAINTAINER for everyone else. */
@Injectable()
export class ProcessMaintainerGuard implements CanActivate {
  canActivate(context: ExecutionContext): boolean {
    const user: Account | undefined = context.switchToHttp().getRequest().user;
    if (isProcessMaintainer(user)) return true;
    throw forbidden('NOT_PROCESS_MAINTAINER', 'Only admins and process maintainers may change process profiles');
  }
}

/** Marks a route as a change to the library. */
export const MaintainersOnly = () => UseGuards(ProcessMaintainerGuard);
