import type { GlobalRole } from '@channelwright/shared/schemas';
import { Injectable, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { forbidden } from '../../common/errors/domain-error.js';
import type { Account } from '../../users/users.service.js';
import { ROLES_KEY } from '../../common/auth/roles.decorator.js';

/** Global, after the JWT guard: a route marked @Roles(...) answers 403 to users without one of those roles. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const roles = this.reflector.getAllAndOverride<GlobalRole[] | undefined>(ROLES_KEY, [context.getHandler(), context.getClass()]);
    if (!roles || roles.length === 0) return true;
    const user: Account | undefined = context.switchToHttp().getRequest().user;
    if (user && roles.includes(user.role)) return true;
    throw forbidden('FORBIDDEN', `Only ${roles.join(' or ')} users may do this`);
  }
}
