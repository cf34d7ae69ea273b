import { Injectable, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { unauthorized } from '../../common/errors/domain-error.js';
import { IS_PUBLIC_KEY } from '../../common/auth/public.decorator.js';

/** Global: every route needs a valid Bearer token unless it is marked @Public(). */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override canActivate(context: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, [context.getHandler(), context.getClass()]);
    return isPublic ? true : super.canActivate(context);
  }

  override handleRequest<TUser>(error: unknown, user: TUser | false, info: unknown): TUser {
    if (error) throw error;
    if (!user) {
      const expired = info instanceof Error && info.name === 'TokenExpiredError';
      throw unauthorized('UNAUTHENTICATED', expired ? 'Your session has expired; sign in again' : 'Sign in to continue');
    }
    return user;
  }
}
