import { EDITING_PROJECT_ROLES, PROJECT_ROLES, REVIEWING_PROJECT_ROLES, type GlobalRole, type ProjectRole } from '@channelwright/shared/schemas';

/**
 * What a request needs of a project. read: see it and everything in it, export; edit: change its
 * sheets and devices, freeze revisions; manage: rename it, add, remove and re-role members;
 * review: decide review requests.
 */
export type ProjectNeed = 'read' | 'edit' | 'manage' | 'review';

const ROLES_FOR: Record<ProjectNeed, readonly ProjectRole[]> = {
  read: PROJECT_ROLES,
  edit: EDITING_PROJECT_ROLES,
  manage: ['owner'],
  review: REVIEWING_PROJECT_ROLES,
};

/**
 * Admins who are not members read every project and manage it (so a project whose owners have left
 * can be handed on), but do not edit sheets or decide reviews: for that they join with a role.
 */
const ADMIN_MAY: Record<ProjectNeed, boolean> = { read: true, edit: false, manage: true, review: false };

/** The roles that meet a need, for messages and for other modules' checks. */
export function rolesFor(need: ProjectNeed): readonly ProjectRole[] {
  return ROLES_FOR[need];
}

/** The one rule: does a user with this global role and this project role (null: not a member) meet the need? */
export function meetsNeed(globalRole: GlobalRole, projectRole: ProjectRole | null, need: ProjectNeed): boolean {
  if (projectRole !== null && ROLES_FOR[need].includes(projectRole)) return true;
  return globalRole === 'admin' && ADMIN_MAY[need];
}

/** Whether the user may know that the project exists at all (members and admins). */
export function seesProject(globalRole: GlobalRole, projectRole: ProjectRole | null): boolean {
  return projectRole !== null || globalRole === 'admin';
}
