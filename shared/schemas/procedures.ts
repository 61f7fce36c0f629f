import { z } from 'zod';
import { dateRangeShape, fromNotAfterTo, idSchema } from './common';

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `use at most ${max} characters`)
    .nullish()
    .transform((v) => (v ? v : null));

export const procedureStepInputSchema = z.object({
  text: z.string().trim().min(1, 'describe the step').max(500, 'use at most 500 characters'),
  caution: optionalText(500),
});
export type ProcedureStepInput = z.infer<typeof procedureStepInputSchema>;

const stepsSchema = z
  .array(procedureStepInputSchema, { error: 'must be a list of steps' })
  .min(1, 'add at least one step')
  .max(100, 'use at most 100 steps');

export const createProcedureSchema = z.object({
  code: z
    .string()
    .trim()
    .min(2, 'use at least 2 characters')
    .max(40, 'use at most 40 characters')
    .regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, 'use letters, digits, dot, dash or underscore'),
  title: z.string().trim().min(1, 'enter a title').max(200, 'use at most 200 characters'),
  changeNote: optionalText(2000),
  steps: stepsSchema,
});
export type CreateProcedureInput = z.infer<typeof createProcedureSchema>;

export const publishVersionSchema = z.object({
  title: z.string().trim().min(1, 'enter a title').max(200, 'use at most 200 characters').optional(),
  changeNote: z.string().trim().min(1, 'say what changed and why').max(2000, 'use at most 2000 characters'),
  steps: stepsSchema,
});
export type PublishVersionInput = z.infer<typeof publishVersionSchema>;

export const versionSummarySchema = z.object({
  id: z.number().int(),
  version: z.number().int(),
  title: z.string(),
  changeNote: z.string().nullable(),
  publishedById: z.number().int().nullable(),
  publishedByName: z.string().nullable(),
  publishedAt: z.string(),
  stepCount: z.number().int(),
});
export type VersionSummaryDto = z.infer<typeof versionSummarySchema>;

export const procedureSchema = z.object({
  id: z.number().int(),
  code: z.string(),
  title: z.string(),
  currentVersionId: z.number().int().nullable(),
  currentVersion: z.number().int().nullable(),
  createdAt: z.string(),
});
export type ProcedureDto = z.infer<typeof procedureSchema>;

export const procedureDetailSchema = procedureSchema.extend({ versions: z.array(versionSummarySchema) });
export type ProcedureDetailDto = z.infer<typeof procedureDetailSchema>;

export const procedureStepSchema = z.object({
  id: z.number().int(),
  position: z.number().int(),
  text: z.string(),
  caution: z.string().nullable(),
  incidentsLinked: z.number().int(),
});
export type ProcedureStepDto = z.infer<typeof procedureStepSchema>;

export const procedureVersionSchema = versionSummarySchema.extend({
  procedureId: z.number().int(),
  procedureCode: z.string(),
  isCurrent: z.boolean(),
  steps: z.array(procedureStepSchema),
});
export type ProcedureVersionDto = z.infer<typeof procedureVersionSchema>;

export const stepLinkInputSchema = z.object({
  stepId: idSchema,
  note: z.string().trim().min(1, 'describe the suspected lapse').max(2000, 'use at most 2000 characters'),
});
export type StepLinkInput = z.infer<typeof stepLinkInputSchema>;

export const stepLinkSchema = z.object({
  id: z.number().int(),
  incidentId: z.number().int(),
  stepId: z.number().int(),
  stepPosition: z.number().int(),
  stepText: z.string(),
  procedureId: z.number().int(),
  procedureTitle: z.string(),
  versionId: z.number().int(),
  version: z.number().int(),
  note: z.string().nullable(),
  linkedById: z.number().int().nullable(),
  linkedByName: z.string(),
  createdAt: z.string(),
});
export type StepLinkDto = z.infer<typeof stepLinkSchema>;

export const stepStatsQuerySchema = z.object(dateRangeShape).refine(...fromNotAfterTo);
export type StepStatsQuery = z.infer<typeof stepStatsQuerySchema>;

export const stepGroupSchema = z.object({
  jars: z.number().int(),
  contaminated: z.number().int(),
  incubating: z.number().int(),
  /** null when the group holds no jars. */
  rate: z.number().nullable(),
});
export type StepGroupDto = z.infer<typeof stepGroupSchema>;

export const stepStatsSchema = z.object({
  stepId: z.number().int(),
  incidentsLinked: z.number().int(),
  ticked: stepGroupSchema,
  notTicked: stepGroupSchema,
  /** Fisher's exact test, two-sided; null unless both groups hold jars. */
  pValue: z.number().nullable(),
});
export type StepStatsDto = z.infer<typeof stepStatsSchema>;
