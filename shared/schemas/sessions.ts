import { z } from 'zod';
import { workspaceSchema } from '../enums';
import {
  dateRangeShape,
  idSchema,
  listQueryOf,
  oneOperator,
  operatorShape,
  recordedDateSchema,
  recordedInstantSchema,
} from './common';
import { registerCodeSchema } from './grain';

export const workspaceLabels = {
  'still-air-box': 'still-air box',
  'flow-hood': 'flow hood',
  'open-bench': 'open bench',
} as const;

export const sessionSchema = z.object({
  id: z.number().int(),
  code: z.string(),
  heldOn: z.string(),
  startedAt: z.string().nullable(),
  operatorId: z.number().int().nullable(),
  operatorName: z.string().nullable(),
  workspace: workspaceSchema.nullable(),
  procedureVersionId: z.number().int().nullable(),
  notes: z.string().nullable(),
  createdAt: z.string(),
});
export type SessionDto = z.infer<typeof sessionSchema>;

export const checklistRowSchema = z.object({
  stepId: z.number().int(),
  position: z.number().int(),
  text: z.string(),
  caution: z.string().nullable(),
  /** null: the step was not ticked either way. */
  done: z.boolean().nullable(),
});
export type ChecklistRowDto = z.infer<typeof checklistRowSchema>;

export const sessionDetailSchema = sessionSchema.extend({
  procedure: z
    .object({
      versionId: z.number().int(),
      procedureId: z.number().int(),
      title: z.string(),
      version: z.number().int(),
    })
    .nullable(),
  checklist: z.array(checklistRowSchema),
});
export type SessionDetailDto = z.infer<typeof sessionDetailSchema>;

const checklistSchema = z
  .array(z.object({ stepId: idSchema, done: z.boolean() }))
  .max(200)
  .refine((rows) => new Set(rows.map((r) => r.stepId)).size === rows.length, 'lists a step more than once');

const sessionFields = {
  code: registerCodeSchema,
  heldOn: recordedDateSchema,
  startedAt: recordedInstantSchema.nullish(),
  ...operatorShape,
  workspace: workspaceSchema,
  procedureVersionId: idSchema.nullish(),
  checklist: checklistSchema.optional(),
  notes: z.string().trim().max(4000).nullish(),
};

export const createSessionSchema = z
  .object(sessionFields)
  .refine(...oneOperator)
  .refine((v) => v.operatorId || v.operatorName, {
    path: ['operatorId'],
    message: 'choose the operator or type a staff name',
  })
  .refine((v) => !v.checklist?.length || v.procedureVersionId, {
    path: ['checklist'],
    message: 'a checklist needs the procedure version it follows',
  });
export type CreateSessionInput = z.infer<typeof createSessionSchema>;

export const updateSessionSchema = z
  .object({ ...sessionFields, reason: z.string().trim().max(500).optional() })
  .partial()
  .refine(...oneOperator);
export type UpdateSessionInput = z.infer<typeof updateSessionSchema>;

export const sessionSortFields = ['code', 'heldOn', 'operator'] as const;

export const sessionFiltersSchema = z.object({
  ...dateRangeShape,
  operator: z.string().trim().max(120).optional(),
  workspace: workspaceSchema.optional(),
  q: z.string().trim().max(120).optional(),
});
export const sessionListQuerySchema = listQueryOf(sessionFiltersSchema);
export type SessionListQuery = z.infer<typeof sessionListQuerySchema>;
export type SessionFilters = z.infer<typeof sessionFiltersSchema>;
