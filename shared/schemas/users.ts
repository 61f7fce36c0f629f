import { z } from 'zod';
import { roleSchema } from '../enums';
import { passwordRule } from './auth';
import { pageQuerySchema } from './common';

export const userSchema = z.object({
  id: z.number().int(),
  username: z.string(),
  displayName: z.string(),
  email: z.string().nullable(),
  role: roleSchema,
  active: z.boolean(),
  mustChangePassword: z.boolean(),
  createdAt: z.string(),
});
export type UserDto = z.infer<typeof userSchema>;

export const createUserSchema = z.object({
  username: z
    .string()
    .trim()
    .min(2, 'use at least 2 characters')
    .max(64)
    .regex(/^[a-z0-9._-]+$/, 'use lower-case letters, digits, dot, dash or underscore'),
  displayName: z.string().trim().min(1, 'enter a name').max(120),
  email: z.union([z.email('must be an e-mail address'), z.literal('')]).optional(),
  role: roleSchema,
  password: passwordRule,
});
export type CreateUserInput = z.infer<typeof createUserSchema>;

export const updateUserSchema = z
  .object({
    displayName: z.string().trim().min(1).max(120),
    email: z.union([z.email('must be an e-mail address'), z.literal('')]),
    role: roleSchema,
    active: z.boolean(),
  })
  .partial();
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

export const userListQuerySchema = pageQuerySchema.extend({
  role: roleSchema.optional(),
  active: z.enum(['true', 'false']).optional(),
  q: z.string().trim().max(64).optional(),
});
export type UserListQuery = z.infer<typeof userListQuerySchema>;

/** A person of the lab as other screens name them (an action's owner, say): no address, no login. */
export const personSchema = z.object({ id: z.number().int(), displayName: z.string(), role: roleSchema });
export type PersonDto = z.infer<typeof personSchema>;

/** An admin's reset: a temporary password they chose, or none for the server to make one. */
export const resetPasswordSchema = z.object({
  temporaryPassword: z.union([passwordRule, z.literal('')]).optional(),
});
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;

/** `generatedPassword` is shown once and never stored in clear; null when the admin chose it. */
export const passwordResetSchema = z.object({ user: userSchema, generatedPassword: z.string().nullable() });
export type PasswordResetDto = z.infer<typeof passwordResetSchema>;
