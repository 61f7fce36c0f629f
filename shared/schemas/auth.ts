import { z } from 'zod';
import { roleSchema } from '../enums';

export const loginSchema = z.object({
  username: z.string().trim().min(1, 'enter your username').max(64),
  password: z.string().min(1, 'enter your password').max(200),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const passwordRule = z.string().min(10, 'use at least 10 characters').max(200);

export const changePasswordSchema = z.object({
  currentPassword: z.string().min(1, 'enter your current password'),
  newPassword: passwordRule,
});
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

export const meSchema = z.object({
  id: z.number().int(),
  username: z.string(),
  displayName: z.string(),
  email: z.string().nullable(),
  role: roleSchema,
  /** After an admin's reset: the person must set a new password before anything else. */
  mustChangePassword: z.boolean(),
});
export type MeDto = z.infer<typeof meSchema>;

export const csrfSchema = z.object({ token: z.string() });
