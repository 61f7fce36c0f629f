import { z } from 'zod';
import {
  causeCategorySchema,
  contaminantSchema,
  incidentSeveritySchema,
  incidentStatusSchema,
  stageFoundSchema,
  verdictSchema,
} from '../enums';
import { dateRangeShape, fromNotAfterTo, idSchema, pageQuerySchema } from './common';

/** Quick picks for the flag screen; free text is accepted too. */
export const signSuggestions = {
  signColour: ['white', 'green', 'blue-green', 'yellow', 'black', 'grey', 'orange-pink', 'cream'],
  signSmell: ['none', 'sour', 'rotten', 'sweet', 'alcoholic', 'musty'],
  signTexture: ['slimy', 'wet', 'powdery', 'cottony', 'wispy', 'pasty', 'patches'],
} as const;

const sign = z.string().trim().max(120, 'use at most 120 characters');
const optionalText = (max: number) => z.string().trim().max(max, `use at most ${max} characters`);
export const reasonSchema = z
  .string()
  .trim()
  .min(3, 'give a reason of at least 3 characters')
  .max(500, 'use at most 500 characters');

export const jarLabelFieldSchema = z
  .string()
  .trim()
  .min(1, 'enter a jar label')
  .max(40, 'a jar label has at most 40 characters');

export const createIncidentSchema = z
  .object({
    jarIds: z.array(idSchema).min(1, 'name at least one jar').max(50, 'at most 50 jars per incident').optional(),
    jarLabels: z
      .array(jarLabelFieldSchema)
      .min(1, 'name at least one jar')
      .max(50, 'at most 50 jars per incident')
      .optional(),
    contaminant: contaminantSchema,
    signColour: sign.optional(),
    signSmell: sign.optional(),
    signTexture: sign.optional(),
    severity: incidentSeveritySchema,
    stage: stageFoundSchema,
    foundAt: z.iso.datetime({ offset: true, error: 'must be a date and time such as 2026-03-01T09:30:00Z' }).optional(),
    sealed: z.boolean(),
    sterilisedBeforeDisposal: z.boolean(),
    notes: optionalText(4000).optional(),
    photoIds: z.array(idSchema).max(24, 'at most 24 photos per incident').optional(),
  })
  .refine((v) => (v.jarIds?.length ?? 0) + (v.jarLabels?.length ?? 0) > 0, {
    path: ['jarLabels'],
    message: 'name at least one jar by label or id',
  });
export type CreateIncidentInput = z.infer<typeof createIncidentSchema>;

const descriptive = {
  contaminant: contaminantSchema,
  signColour: sign.nullable(),
  signSmell: sign.nullable(),
  signTexture: sign.nullable(),
  severity: incidentSeveritySchema,
  stage: stageFoundSchema,
  foundAt: z.iso.datetime({ offset: true, error: 'must be a date and time such as 2026-03-01T09:30:00Z' }),
  sealed: z.boolean(),
  sterilisedBeforeDisposal: z.boolean(),
  notes: optionalText(4000).nullable(),
};
export const descriptiveIncidentFields = Object.keys(descriptive) as (keyof typeof descriptive)[];

export const updateIncidentSchema = z
  .object({ version: z.number().int().min(1), reason: reasonSchema.optional() })
  .extend(z.object(descriptive).partial().shape)
  .refine((v) => descriptiveIncidentFields.some((k) => v[k] !== undefined), {
    path: ['contaminant'],
    message: 'change at least one field',
  });
export type UpdateIncidentInput = z.infer<typeof updateIncidentSchema>;

export const reviewIncidentSchema = z
  .object({
    status: incidentStatusSchema.optional(),
    verdict: verdictSchema.optional(),
    causeCategory: causeCategorySchema.nullable().optional(),
    rootCauseNotes: optionalText(4000).nullable().optional(),
    reason: reasonSchema.optional(),
    version: z.number().int().min(1).optional(),
  })
  .refine((v) => [v.status, v.verdict, v.causeCategory, v.rootCauseNotes].some((x) => x !== undefined), {
    path: ['status'],
    message: 'set a status, verdict, cause category or root-cause notes',
  });
export type ReviewIncidentInput = z.infer<typeof reviewIncidentSchema>;

export const voidIncidentSchema = z.object({ reason: reasonSchema, version: z.number().int().min(1).optional() });
export type VoidIncidentInput = z.infer<typeof voidIncidentSchema>;

export const addIncidentPhotosSchema = z.object({
  photoIds: z.array(idSchema).min(1, 'pick at least one photo').max(24, 'at most 24 photos per incident'),
});
export type AddIncidentPhotosInput = z.infer<typeof addIncidentPhotosSchema>;

const boolQuery = z.enum(['true', 'false']);
export const incidentListQuerySchema = pageQuerySchema
  .extend({
    status: incidentStatusSchema.optional(),
    verdict: verdictSchema.optional(),
    contaminant: contaminantSchema.optional(),
    cookRunId: idSchema.optional(),
    cultureId: idSchema.optional(),
    sessionId: idSchema.optional(),
    operator: z.string().trim().min(1).max(120).optional(),
    jar: z.string().trim().min(1).max(40).optional(),
    /** One box for a picker: an incident number with or without #, a jar label, an operator or a contaminant. */
    q: z.string().trim().min(1).max(80).optional(),
    ...dateRangeShape,
    voided: boolQuery.optional(),
  })
  .refine(...fromNotAfterTo);
export type IncidentListQuery = z.infer<typeof incidentListQuerySchema>;
export type IncidentFilters = Omit<IncidentListQuery, 'page' | 'pageSize' | 'sort'>;
export const incidentSortFields = ['foundAt', 'id', 'contaminant', 'status', 'verdict', 'severity', 'stage'] as const;

export const incidentListItemSchema = z.object({
  id: z.number().int(),
  foundAt: z.string(),
  foundOn: z.string(),
  foundByName: z.string(),
  stage: stageFoundSchema,
  contaminant: contaminantSchema,
  severity: incidentSeveritySchema,
  status: incidentStatusSchema,
  verdict: verdictSchema,
  voided: z.boolean(),
  jarLabels: z.array(z.string()),
  jarCount: z.number().int(),
  photoCount: z.number().int(),
  version: z.number().int(),
});
export type IncidentListItemDto = z.infer<typeof incidentListItemSchema>;
