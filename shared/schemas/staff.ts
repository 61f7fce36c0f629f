import { z } from 'zod';
import { pageQuerySchema } from './common';

/** A person of the lab without an account (or not yet): an operator, a trainee, an action's owner. */
export const staffMemberSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string().nullable(),
  active: z.boolean(),
  createdAt: z.string(),
});
export type StaffMemberDto = z.infer<typeof staffMemberSchema>;

const name = z.string().trim().min(1, 'enter a name').max(120);
const email = z.union([z.email('must be an e-mail address'), z.literal('')]);

export const createStaffMemberSchema = z.object({ name, email: email.optional() });
export type CreateStaffMemberInput = z.infer<typeof createStaffMemberSchema>;

export const updateStaffMemberSchema = z.object({ name, email, active: z.boolean() }).partial();
export type UpdateStaffMemberInput = z.infer<typeof updateStaffMemberSchema>;

export const staffListQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(64).optional(),
  active: z.enum(['true', 'false']).optional(),
});
export type StaffListQuery = z.infer<typeof staffListQuerySchema>;
