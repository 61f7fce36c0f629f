import { z } from 'zod';
import { contaminantSchema, factorSchema, incidentStatusSchema } from '../enums';
import { idSchema, listQueryOf, localDateSchema, pageOf } from './common';
import { reasonSchema } from './incidents';

export const ownerEmailSchema = z.email({ error: 'must be an e-mail address' }).max(254);
const ownerShape = {
  ownerId: idSchema.optional(),
  ownerName: z.string().trim().min(1, 'enter the owner').max(120).optional(),
};
/** A staff owner without an account may be mailed at an address of their own; a user is mailed at theirs. */
const emailOnlyWithName: [
  (v: { ownerId?: number; ownerEmail?: string | null }) => boolean,
  { path: string[]; message: string },
] = [
  (v) => !(v.ownerId !== undefined && v.ownerEmail),
  { path: ['ownerEmail'], message: 'a user is mailed at their account’s address: leave this empty' },
];
export const createActionSchema = z
  .object({
    what: z.string().trim().min(3, 'say what will be done').max(2000),
    ...ownerShape,
    ownerEmail: ownerEmailSchema.optional(),
    dueOn: localDateSchema,
    factor: factorSchema.optional(),
    level: z.string().trim().min(1).max(120).optional(),
  })
  .refine(...emailOnlyWithName)
  .refine((v) => v.ownerId !== undefined || v.ownerName !== undefined, {
    path: ['ownerName'],
    message: 'name an owner',
  })
  .refine((v) => (v.factor === undefined) === (v.level === undefined), {
    path: ['level'],
    message: 'give both the factor and its level, or neither',
  });
export type CreateActionInput = z.infer<typeof createActionSchema>;

export const updateActionSchema = z
  .object({
    what: z.string().trim().min(3, 'say what will be done').max(2000),
    ...ownerShape,
    ownerEmail: ownerEmailSchema.nullable(),
    dueOn: localDateSchema,
    doneOn: localDateSchema.nullable(),
    verification: z.string().trim().min(3, 'say how the fix was verified').max(2000).nullable(),
    factor: factorSchema.nullable(),
    level: z.string().trim().min(1).max(120).nullable(),
    reason: reasonSchema,
  })
  .partial()
  .refine((v) => Object.entries(v).some(([k, x]) => k !== 'reason' && x !== undefined), {
    path: ['doneOn'],
    message: 'change at least one field',
  })
  .refine(...emailOnlyWithName);
export type UpdateActionInput = z.infer<typeof updateActionSchema>;

export const correctiveActionSchema = z.object({
  id: z.number().int(),
  incidentId: z.number().int(),
  what: z.string(),
  ownerId: z.number().int().nullable(),
  ownerName: z.string(),
  ownerEmail: z.string().nullable(),
  dueOn: z.string(),
  doneOn: z.string().nullable(),
  verification: z.string().nullable(),
  factor: factorSchema.nullable(),
  level: z.string().nullable(),
  overdue: z.boolean(),
  createdAt: z.string(),
});
export type CorrectiveActionDto = z.infer<typeof correctiveActionSchema>;

/** open: not done; overdue: not done and past due; due-soon: not done, due today to 7 days on; done. */
export const actionStates = ['open', 'overdue', 'due-soon', 'done'] as const;
export const actionStateSchema = z.enum(actionStates, { error: 'must be open, overdue, due-soon or done' });
export type ActionState = (typeof actionStates)[number];

export const actionFiltersSchema = z.object({
  state: actionStateSchema.optional(),
  mine: z.enum(['true', 'false']).optional(),
  incidentId: idSchema.optional(),
  factor: factorSchema.optional(),
  level: z.string().trim().min(1).max(120).optional(),
  q: z.string().trim().max(80).optional(),
});
export type ActionFilters = z.infer<typeof actionFiltersSchema>;
export const actionListQuerySchema = listQueryOf(actionFiltersSchema).refine(
  (v) => v.level === undefined || v.factor !== undefined,
  { path: ['factor'], message: 'name the factor of the level' },
);
export type ActionListQuery = z.infer<typeof actionListQuerySchema>;
export const actionSortFields = ['dueOn', 'createdAt', 'doneOn', 'ownerName', 'incidentId'] as const;

export const actionListItemSchema = correctiveActionSchema.extend({
  incident: z.object({
    id: z.number().int(),
    contaminant: contaminantSchema,
    status: incidentStatusSchema,
    foundOn: z.string(),
    voided: z.boolean(),
  }),
});
export type ActionListItemDto = z.infer<typeof actionListItemSchema>;
export const actionPageSchema = pageOf(actionListItemSchema);

export const reminderResultSchema = z.object({ reminded: z.number().int(), failed: z.number().int() });
export type ReminderResultDto = z.infer<typeof reminderResultSchema>;
