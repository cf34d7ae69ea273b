import { z } from 'zod';
import { globalRoleSchema } from './roles.js';

export const emailSchema = z
  .string({ error: 'E-mail is required' })
  .trim()
  .min(1, 'E-mail is required')
  .max(254, 'E-mail is too long')
  .email('Enter a valid e-mail address')
  .transform((value) => value.toLowerCase());

export const passwordSchema = z
  .string({ error: 'Password is required' })
  .min(10, 'Password must have at least 10 characters')
  .max(200, 'Password is too long');

export const loginRequestSchema = z.object({
  email: emailSchema,
  password: z.string({ error: 'Password is required' }).min(1, 'Password is required').max(200),
});
export type LoginRequest = z.infer<typeof loginRequestSchema>;

export const registerRequestSchema = z.object({
  email: emailSchema,
  displayName: z.string({ error: 'Display name is required' }).trim().min(1, 'Display name is required').max(100),
  password: passwordSchema,
});
export type RegisterRequest = z.infer<typeof registerRequestSchema>;

/** Finishing sign-up: the token from the link mailed to the address, and the password chosen at sign-up. */
export const confirmEmailRequestSchema = z.object({
  token: z.string({ error: 'The confirmation link is incomplete' }).min(1, 'The confirmation link is incomplete').max(2000),
  password: z.string({ error: 'Password is required' }).min(1, 'Password is required').max(200),
});
export type ConfirmEmailRequest = z.infer<typeof confirmEmailRequestSchema>;

export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  role: globalRoleSchema,
  disabled: z.boolean(),
  processMaintainer: z.boolean(),
  /**
   * Granted by an admin: reads the whole process library, not only the processes of the user's projects.
   * The server always sends it; optional only so that a client older than the field still reads a user.
   */
  libraryAccess: z.boolean().optional(),
  createdAt: z.string(),
});
export type User = z.infer<typeof userSchema>;

export const authResponseSchema = z.object({
  accessToken: z.string(),
  user: userSchema,
});
export type AuthResponse = z.infer<typeof authResponseSchema>;

/**
 * The answer to a registration. The very first account of a server is signed in at once; every later one
 * gets `confirmation-sent`, whether the address was new or taken (no account enumeration): the link in
 * the mail, or the notice to the owner of a taken address, tells the rest.
 */
export const registerResponseSchema = z.discriminatedUnion('status', [
  authResponseSchema.extend({ status: z.literal('signed-in') }),
  z.object({ status: z.literal('confirmation-sent'), email: z.string() }),
]);
export type RegisterResponse = z.infer<typeof registerResponseSchema>;

export const updateUserRequestSchema = z
  .object({
    role: globalRoleSchema.optional(),
    disabled: z.boolean().optional(),
    processMaintainer: z.boolean().optional(),
    libraryAccess: z.boolean().optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Give at least one of role, disabled, processMaintainer, libraryAccess' });
export type UpdateUserRequest = z.infer<typeof updateUserRequestSchema>;

export const healthResponseSchema = z.object({
  status: z.literal('ok'),
  version: z.string(),
  db: z.literal('ok'),
});
export type HealthResponse = z.infer<typeof healthResponseSchema>;

/** What the client needs to know about the server before sign-in. */
export const publicConfigSchema = z.object({
  signupEnabled: z.boolean(),
  demo: z.boolean(),
  version: z.string(),
});
export type PublicConfig = z.infer<typeof publicConfigSchema>;
