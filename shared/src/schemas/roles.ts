import { z } from 'zod';

/** A user's role across the whole installation. */
export const GLOBAL_ROLES = ['admin', 'member'] as const;
export const globalRoleSchema = z.enum(GLOBAL_ROLES);
export type GlobalRole = z.infer<typeof globalRoleSchema>;

/**
 * A user's role inside one project.
 * owner: manages members and everything a designer does; designer: sizes devices, freezes
 * revisions, requests reviews; reviewer: reads, comments, decides reviews; viewer: reads, exports.
 */
export const PROJECT_ROLES = ['owner', 'designer', 'reviewer', 'viewer'] as const;
export const projectRoleSchema = z.enum(PROJECT_ROLES);
export type ProjectRole = z.infer<typeof projectRoleSchema>;

/** Project roles allowed to change sheets and devices. */
export const EDITING_PROJECT_ROLES: readonly ProjectRole[] = ['owner', 'designer'];
/** Project roles allowed to decide a review request. */
export const REVIEWING_PROJECT_ROLES: readonly ProjectRole[] = ['owner', 'reviewer'];
