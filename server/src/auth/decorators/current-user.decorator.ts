import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { UserEntity } from '../../users/user.entity.js';

/** The signed-in user, loaded fresh from the database by the JWT strategy on every request. */
export const CurrentUser = createParamDecorator(
  (_data: unknown, context: ExecutionContext): UserEntity => context.switchToHttp().getRequest().user,
);
