import { z } from 'zod';
import { emailSchema } from './auth.js';
import { userRefSchema } from './process-profile.js';
import { projectRoleSchema } from './roles.js';

/**
 * Projects and their members: request and response schemas of /api/projects. A project holds the
 * sheets of a chip block; each member has one project role (owner, designer, reviewer, viewer).
 * Outsiders get 404 for anything of a project they are not in. Admins read every project and manage
 * its members and its name, but edit sheets only when they are members with an editing role.
 * Dates are ISO 8601 text.
 */

/** The optimistic-concurrency version of a row in a body: the version the client edited. */
export const editedVersionSchema = z
  .number({ error: 'version must be a whole number' })
  .int('version must be a whole number')
  .positive('version must be at least 1')
  .describe('The version the client edited; 409 STALE_EDIT (nothing written) when the stored one differs');

const projectName = z
  .string({ error: 'name must be text' })
  .trim()
  .min(1, 'name must not be empty')
  .max(100, 'name must have at most 100 characters');

const projectDescription = z.string({ error: 'description must be text' }).trim().max(2000, 'description must have at most 2000 characters');

// ── writes ─────────────────────────────────────────────────────────────────────────────────────────

export const createProjectRequestSchema = z.strictObject({
  name: projectName,
  description: projectDescription.default(''),
});
export type CreateProjectRequest = z.infer<typeof createProjectRequestSchema>;
export type CreateProjectRequestInput = z.input<typeof createProjectRequestSchema>;

export const updateProjectRequestSchema = z
  .strictObject({
    version: editedVersionSchema,
    name: projectName.optional(),
    description: projectDescription.optional(),
  })
  .refine((value) => value.name !== undefined || value.description !== undefined, { path: ['name'], message: 'Give at least one of name, description' });
export type UpdateProjectRequest = z.infer<typeof updateProjectRequestSchema>;

export const addMemberRequestSchema = z.strictObject({
  email: emailSchema.describe('The e-mail of an existing account'),
  role: projectRoleSchema,
});
export type AddMemberRequest = z.infer<typeof addMemberRequestSchema>;

export const updateMemberRequestSchema = z.strictObject({
  role: projectRoleSchema,
});
export type UpdateMemberRequest = z.infer<typeof updateMemberRequestSchema>;

// ── responses ──────────────────────────────────────────────────────────────────────────────────────

export const projectSchema = z.object({
  id: z.string(),
  name: z.string(),
  description: z.string(),
  version: z.number().int().describe('Raised by every change of name or description'),
  myRole: projectRoleSchema.nullable().describe('The caller\'s role; null for an admin who is not a member'),
  createdBy: userRefSchema.nullable(),
  memberCount: z.number().int(),
  sheetCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Project = z.infer<typeof projectSchema>;

export const projectListSchema = z.array(projectSchema).describe('The caller\'s projects (every project for admins), by name');
export type ProjectList = z.infer<typeof projectListSchema>;

export const projectMemberSchema = z.object({
  userId: z.string(),
  email: z.string(),
  displayName: z.string(),
  role: projectRoleSchema,
  addedAt: z.string(),
});
export type ProjectMember = z.infer<typeof projectMemberSchema>;

export const projectMemberListSchema = z.array(projectMemberSchema).describe('Members by role (owner first), then by name');
export type ProjectMemberList = z.infer<typeof projectMemberListSchema>;
