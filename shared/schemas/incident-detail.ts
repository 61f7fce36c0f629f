import { z } from 'zod';
import { causeCategorySchema, jarStatusSchema } from '../enums';
import { correctiveActionSchema } from './corrective-actions';
import { incidentListItemSchema } from './incidents';
import { photoSchema } from './photos';

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

export const incidentStepLinkSchema = z.object({
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
export type IncidentStepLinkDto = z.infer<typeof incidentStepLinkSchema>;

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
    stepLinks: z.array(incidentStepLinkSchema),
    actions: z.array(correctiveActionSchema),
    history: z.array(historyEntrySchema),
  });
export type IncidentDetailDto = z.infer<typeof incidentDetailSchema>;
