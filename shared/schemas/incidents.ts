import { z } from 'zod';
import {
  causeCategorySchema,
  contaminantSchema,
  factorSchema,
  incidentSeveritySchema,
  incidentStatusSchema,
  jarStatusSchema,
  stageFoundSchema,
  verdictSchema,
} from '../enums';
import { dateRangeShape, fromNotAfterTo, idSchema, localDateSchema, pageQuerySchema } from './common';
import { photoSchema } from './photos';

/** Quick picks for the flag screen; free text is accepted too. */
export const signSuggestions = {
  signColour: ['white', 'green', 'blue-green', 'yellow', 'black', 'grey', 'orange-pink', 'cream'],
  signSmell: ['none', 'sour', 'rotten', 'sweet', 'alcoholic', 'musty'],
  signTexture: ['slimy', 'wet', 'powdery', 'cottony', 'wispy', 'pasty', 'patches'],
} as const;

const sign = z.string().trim().max(120, 'use at most 120 characters');
const optionalText = (max: number) => z.string().trim().max(max, `use at most ${max} characters`);
const reasonSchema = z
  .string()
  .trim()
  .min(3, 'give a reason of at least 3 characters')
  .max(500, 'use at most 500 characters');

export const jarLabelSchema = z
  .string()
  .trim()
  .min(1, 'enter a jar label')
  .max(40, 'a jar label has at most 40 characters');

export const createIncidentSchema = z
  .object({
    jarIds: z.array(idSchema).min(1, 'name at least one jar').max(50, 'at most 50 jars per incident').optional(),
    jarLabels: z
      .array(jarLabelSchema)
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

const codeRef = z.object({ id: z.number().int(), code: z.string() }).nullable();
export const incidentJarSchema = z.object({
  id: z.number().int(),
  label: z.string(),
  status: jarStatusSchema,
  grain: z.string(),
  inoculatedOn: z.string(),
  room: z.string().nullable(),
  shelf: z.string().nullable(),
  cookRun: codeRef,
  session: z.object({ id: z.number().int(), code: z.string(), operatorName: z.string().nullable() }).nullable(),
  culture: codeRef,
  parentJar: z.object({ id: z.number().int(), label: z.string() }).nullable(),
  /** Inoculum chain from the nearest parent jar up to the culture it came from. */
  ancestry: z.array(z.object({ kind: z.enum(['jar', 'culture']), id: z.number().int(), code: z.string() })),
});
export type IncidentJarDto = z.infer<typeof incidentJarSchema>;

export const incidentPhotoSchema = photoSchema.extend({
  caption: z.string().nullable(),
  addedAt: z.string(),
});
export type IncidentPhotoDto = z.infer<typeof incidentPhotoSchema>;

export const stepLinkSchema = z.object({
  id: z.number().int(),
  stepId: z.number().int(),
  position: z.number().int().nullable(),
  stepText: z.string().nullable(),
  procedureTitle: z.string().nullable(),
  procedureVersion: z.number().int().nullable(),
  linkedByName: z.string(),
  note: z.string().nullable(),
  createdAt: z.string(),
});
export type StepLinkDto = z.infer<typeof stepLinkSchema>;

export const historyEntrySchema = z.object({
  id: z.string(),
  at: z.string(),
  userName: z.string(),
  action: z.string(),
  recordType: z.string(),
  recordId: z.string(),
  field: z.string().nullable(),
  oldValue: z.string().nullable(),
  newValue: z.string().nullable(),
  reason: z.string().nullable(),
});
export type HistoryEntryDto = z.infer<typeof historyEntrySchema>;

export const incidentDetailSchema = incidentListItemSchema
  .omit({ jarLabels: true, jarCount: true, photoCount: true })
  .extend({
    foundById: z.number().int().nullable(),
    signColour: z.string().nullable(),
    signSmell: z.string().nullable(),
    signTexture: z.string().nullable(),
    sealed: z.boolean(),
    sterilisedBeforeDisposal: z.boolean(),
    voidReason: z.string().nullable(),
    causeCategory: causeCategorySchema.nullable(),
    rootCauseNotes: z.string().nullable(),
    notes: z.string().nullable(),
    imported: z.boolean(),
    createdAt: z.string(),
    updatedAt: z.string(),
    jars: z.array(incidentJarSchema),
    photos: z.array(incidentPhotoSchema),
    stepLinks: z.array(stepLinkSchema),
    actions: z.array(correctiveActionSchema),
    history: z.array(historyEntrySchema),
  });
export type IncidentDetailDto = z.infer<typeof incidentDetailSchema>;
