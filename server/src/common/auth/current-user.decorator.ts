import { createParamDecorator, type ExecutionContext } from '@nestjs/common';

/**
 * The signed-in user, loaded fresh from the database by the JWT strategy on every request. Handlers type
 * it as the users module's `Account`.
 */
export const CurrentUser = createParamDecorator((_data: unknown, context: ExecutionContext): unknown => context.switchToHttp().getRequest().user);
