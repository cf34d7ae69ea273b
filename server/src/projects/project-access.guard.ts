import { applyDecorators, createParamDecorator, Injectable, SetMetadata, UseGuards, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { ModuleRef, Reflector } from '@nestjs/core';
import type { Account } from '../users/users.service.js';
import { ProjectAccessService, projectNotFound, type ProjectAccess as Access } from './project-access.service.js';
import type { ProjectNeed } from './project-need.js';
import { PROJECT_RESOURCE_RESOLVERS, type ProjectResourceResolver } from './project-resource-resolver.js';

const PROJECT_ACCESS_KEY = 'channelwright:project-access';

interface AccessRule {
  need: ProjectNeed;
  /** "project" (the param is the project id) or the kind of a ProjectResourceResolver. */
  kind: string;
  param: string;
}

/** What the guard leaves on the request for the handler. */
export interface ProjectAccessContext extends Access {
  /** The id taken from the route parameter (the project's, or the sheet's …). */
  resourceId: string;
}

/**
 * Guards a route of a project resource: the project is found from route parameter `param` (a project
 * id, or the id of a resource of `kind`, e.g. "sheet"), and ProjectAccessService decides.
 */
export const ProjectAccess = (need: ProjectNeed, kind = 'project', param = 'id') =>
  applyDecorators(SetMetadata(PROJECT_ACCESS_KEY, { need, kind, param } satisfies AccessRule), UseGuards(ProjectAccessGuard));

/** The access the guard granted: `@CurrentProjectAccess() access: ProjectAccessContext`. */
export const CurrentProjectAccess = createParamDecorator(
  (_data: unknown, context: ExecutionContext): ProjectAccessContext => context.switchToHttp().getRequest().projectAccess,
);

@Injectable()
export class ProjectAccessGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly moduleRef: ModuleRef,
    private readonly access: ProjectAccessService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const rule = this.reflector.get<AccessRule | undefined>(PROJECT_ACCESS_KEY, context.getHandler());
    if (!rule) throw new Error('ProjectAccessGuard used without @ProjectAccess()');
    const request = context.switchToHttp().getRequest();
    const user: Account = request.user;
    const resourceId = String(request.params[rule.param] ?? '');
    const resolver = rule.kind === 'project' ? undefined : this.resolver(rule.kind);
    const projectId = resolver ? await resolver.projectIdOf(resourceId) : resourceId;
    const notFound = resolver ? () => resolver.notFound() : projectNotFound;
    if (projectId === null) throw notFound();
    const granted = await this.access.require(user, projectId, rule.need, { notFound });
    request.projectAccess = { ...granted, resourceId } satisfies ProjectAccessContext;
    return true;
  }

  private resolver(kind: string): ProjectResourceResolver {
    const resolvers = this.moduleRef.get<ProjectResourceResolver>(PROJECT_RESOURCE_RESOLVERS, { strict: false, each: true });
    const found = resolvers.find((candidate) => candidate.kind === kind);
    if (!found) throw new Error(`No ProjectResourceResolver of kind "${kind}" is registered`);
    return found;
  }
}
