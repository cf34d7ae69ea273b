import { AsyncLocalStorage } from 'node:async_hooks';
import { Injectable, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import { Observable } from 'rxjs';

const actors = new AsyncLocalStorage<{ actorId: string | null }>();

/** The signed-in user of the request being handled; null outside a request (seed, start-up) or on a public route. */
export function currentActor(): { id: string } | null {
  const actorId = actors.getStore()?.actorId ?? null;
  return actorId === null ? null : { id: actorId };
}

/**
 * Runs every HTTP handler with its signed-in user at hand (AsyncLocalStorage, which Nest's
 * interceptor chain carries into the handler), so a service can record who did something without
 * every signature passing the user along. Registered globally by AuditModule.
 */
@Injectable()
export class AuditActorInterceptor implements NestInterceptor {
  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    if (context.getType() !== 'http') return next.handle();
    const user: { id?: string } | undefined = context.switchToHttp().getRequest().user;
    return new Observable((subscriber) => actors.run({ actorId: user?.id ?? null }, () => next.handle().subscribe(subscriber)));
  }
}
