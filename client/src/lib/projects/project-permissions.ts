import { EDITING_PROJECT_ROLES, type Project, type User } from '@channelwright/shared/schemas';

/**
 * What the caller may do inside a project. The server enforces the same rules; the client only
 * hides what would be refused.
 */
export const canEditSheets = (project: Pick<Project, 'myRole'>): boolean =>
  project.myRole !== null && EDITING_PROJECT_ROLES.includes(project.myRole);

/** Owners manage members; so do administrators, members or not. */
export const canManageMembers = (project: Pick<Project, 'myRole'>, user: Pick<User, 'role'>): boolean =>
  project.myRole === 'owner' || user.role === 'admin';
