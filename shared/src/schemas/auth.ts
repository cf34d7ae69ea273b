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

export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  role: globalRoleSchema,
  disabled: z.boolean(),
  processMaintainer: z.boolean(),
  createdAt: z.string(),
});
export type User = z.infer<typeof userSchema>;

export const authResponseSchema = z.object({
  accessToken: z.string(),
  user: userSchema,
});
export type AuthResponse = z.infer<typeof authResponseSchema>;

export const updateUserRequestSchema = z
  .object({
    role: globalRoleSchema.optional(),
    disabled: z.boolean().optional(),
    processMaintainer: z.boolean().optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Give at least one of role, disabled, processMaintainer' });
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
