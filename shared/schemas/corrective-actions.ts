import { z } from 'zod';
import { contaminantSchema, factorSchema, incidentStatusSchema } from '../enums';
import { idSchema, listQueryOf, pageOf } from './common';
import { correctiveActionSchema } from './incidents';

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
