import { z } from 'zod';
import { mailKindSchema, mailStatusSchema, type MailKind, type Role } from '../enums';
import { pageQuerySchema } from './common';

export const mailKindLabels: Record<MailKind, string> = {
  'new-incident': 'A new incident is filed',
  'cluster-alert': 'Several incidents share a cook run, culture or session',
  retraining: 'You are asked to retrain on a procedure',
  'weekly-digest': 'Monday digest with the weekly contamination table',
  'action-assigned': 'A corrective action is given to you',
  'action-overdue': 'A corrective action you own is overdue (one reminder)',
};

/** Who is sent each kind; a person can still turn a kind off for themselves. */
export const mailAudience: Record<MailKind, readonly Role[] | 'addressee'> = {
  'new-incident': ['supervisor'],
  'cluster-alert': ['supervisor', 'trainer'],
  retraining: 'addressee',
  'weekly-digest': ['supervisor', 'trainer', 'admin'],
  'action-assigned': 'addressee',
  'action-overdue': 'addressee',
};

export const mailPreferencesSchema = z.object({
  'new-incident': z.boolean(),
  'cluster-alert': z.boolean(),
  retraining: z.boolean(),
  'weekly-digest': z.boolean(),
  'action-assigned': z.boolean(),
  'action-overdue': z.boolean(),
});
export type MailPreferencesDto = z.infer<typeof mailPreferencesSchema>;

export const updateMailPreferencesSchema = mailPreferencesSchema
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'name at least one kind of mail' });
export type UpdateMailPreferencesInput = z.infer<typeof updateMailPreferencesSchema>;

export const sentMailListQuerySchema = pageQuerySchema.extend({
  kind: mailKindSchema.optional(),
  status: mailStatusSchema.optional(),
});
export type SentMailListQuery = z.infer<typeof sentMailListQuerySchema>;

export const sentMailSchema = z.object({
  id: z.number().int(),
  kind: mailKindSchema,
  to: z.string(),
  toUserId: z.number().int().nullable(),
  subject: z.string(),
  status: mailStatusSchema,
  error: z.string().nullable(),
  createdAt: z.string(),
});
export type SentMailDto = z.infer<typeof sentMailSchema>;

export const sentMailDetailSchema = sentMailSchema.extend({ text: z.string() });
export type SentMailDetailDto = z.infer<typeof sentMailDetailSchema>;

export const digestResultSchema = z.object({
  week: z.string(),
  sent: z.number().int(),
  failed: z.number().int(),
  skipped: z.boolean(),
});
export type DigestResultDto = z.infer<typeof digestResultSchema>;
