import type { DomainError } from '../common/errors/domain-error.js';

/**
 * How the project access guard finds the project of a route's resource: each feature whose routes
 * address something inside a project (a sheet, a revision, a review request …) provides one with
 * `{ provide: PROJECT_RESOURCE_RESOLVERS, useClass: … }`; ProjectAccessGuard collects them all.
 */
export interface ProjectResourceResolver {
  /** The name `@ProjectAccess(need, kind)` refers to, e.g. "sheet". */
  readonly kind: string;
  /** The project the resource belongs to, or null when there is no such resource. */
  projectIdOf(resourceId: string): Promise<string | null>;
  /** The 404 for a missing resource; outsiders get the same one. */
  notFound(): DomainError;
}

export const PROJECT_RESOURCE_RESOLVERS = Symbol('PROJECT_RESOURCE_RESOLVERS');
