import { z } from 'zod';
import { agarResultSchema, cultureStateSchema, cultureStates, type CultureState } from '../enums';
import { idSchema, listQueryOf, recordedDateSchema } from './common';
import { registerCodeSchema } from './grain';

/** The only state changes a culture may make; retired is final. */
export const cultureTransitions: Record<CultureState, readonly CultureState[]> = {
  quarantined: ['released', 'retired'],
  released: ['retired'],
  retired: [],
};

export const cultureSchema = z.object({
  id: z.number().int(),
  code: z.string(),
  species: z.string().nullable(),
  strain: z.string().nullable(),
  preparedOn: z.string().nullable(),
  generation: z.number().int().nullable(),
  volumeMl: z.number().nullable(),
  parentCultureId: z.number().int().nullable(),
  parentCode: z.string().nullable(),
  state: cultureStateSchema,
  notes: z.string().nullable(),
  createdAt: z.string(),
});
export type CultureDto = z.infer<typeof cultureSchema>;

export const agarTestSchema = z.object({
  id: z.number().int(),
  cultureId: z.number().int(),
  testedOn: z.string(),
  result: agarResultSchema,
  notes: z.string().nullable(),
  photoId: z.number().int().nullable(),
  recordedById: z.number().int().nullable(),
  createdAt: z.string(),
});
export type AgarTestDto = z.infer<typeof agarTestSchema>;

export const cultureSummarySchema = cultureSchema.pick({ id: true, code: true, state: true, preparedOn: true });
export type CultureSummaryDto = z.infer<typeof cultureSummarySchema>;

export const cultureDetailSchema = cultureSchema.extend({
  parent: cultureSummarySchema.nullable(),
  children: z.array(cultureSummarySchema),
  agarTests: z.array(agarTestSchema),
  allowedStates: z.array(cultureStateSchema),
});
export type CultureDetailDto = z.infer<typeof cultureDetailSchema>;

const cultureFields = {
  code: registerCodeSchema,
  species: z.string().trim().min(1).max(120).nullish(),
  strain: z.string().trim().max(120).nullish(),
  preparedOn: recordedDateSchema.nullish(),
  generation: z.number().int('must be a whole number').min(0).max(99).nullish(),
  volumeMl: z.number().positive('must be more than 0 ml').max(100000).nullish(),
  parentCultureId: idSchema.nullish(),
  notes: z.string().trim().max(4000).nullish(),
};

export const createCultureSchema = z.object(cultureFields);
export type CreateCultureInput = z.infer<typeof createCultureSchema>;

export const updateCultureSchema = z
  .object({ ...cultureFields, reason: z.string().trim().max(500).optional() })
  .partial();
export type UpdateCultureInput = z.infer<typeof updateCultureSchema>;

export const changeCultureStateSchema = z.object({
  state: cultureStateSchema,
  reason: z.string().trim().min(3, 'say why, in at least 3 characters').max(500),
});
export type ChangeCultureStateInput = z.infer<typeof changeCultureStateSchema>;

export const createAgarTestSchema = z.object({
  testedOn: recordedDateSchema,
  result: agarResultSchema,
  notes: z.string().trim().max(2000).nullish(),
  photoId: idSchema.nullish(),
});
export type CreateAgarTestInput = z.infer<typeof createAgarTestSchema>;

export const cultureSortFields = ['code', 'preparedOn', 'state', 'species'] as const;

export const cultureFiltersSchema = z.object({
  state: z.enum(cultureStates).optional(),
  q: z.string().trim().max(120).optional(),
});
export const cultureListQuerySchema = listQueryOf(cultureFiltersSchema);
export type CultureListQuery = z.infer<typeof cultureListQuerySchema>;
export type CultureFilters = z.infer<typeof cultureFiltersSchema>;
