import { z } from 'zod';
import { idSchema, pageQuerySchema, recordedDateSchema } from './common';

const optionalText = (max: number) => z.string().trim().max(max).nullish();

/** The code every production register is looked up by (prep batches, cook runs, cultures, sessions). */
export const registerCodeSchema = z
  .string()
  .trim()
  .min(1, 'enter a code')
  .max(40, 'use at most 40 characters')
  .regex(/^[A-Za-z0-9][A-Za-z0-9._/-]*$/, 'use letters, digits, dot, dash, slash or underscore');

export const grainSchema = z.object({ id: z.number().int(), name: z.string(), active: z.boolean() });
export type GrainDto = z.infer<typeof grainSchema>;

export const createGrainSchema = z.object({
  name: z.string().trim().min(2, 'use at least 2 characters').max(60),
});
export type CreateGrainInput = z.infer<typeof createGrainSchema>;

export const grainLotSchema = z.object({
  id: z.number().int(),
  grainId: z.number().int(),
  grain: z.string(),
  supplierLotCode: z.string(),
  receivedOn: z.string(),
  notes: z.string().nullable(),
  prepBatchCount: z.number().int(),
  createdAt: z.string(),
});
export type GrainLotDto = z.infer<typeof grainLotSchema>;

export const createGrainLotSchema = z.object({
  grainId: idSchema,
  supplierLotCode: z.string().trim().min(1, 'enter the supplier lot code').max(80),
  receivedOn: recordedDateSchema,
  notes: optionalText(2000),
});
export type CreateGrainLotInput = z.infer<typeof createGrainLotSchema>;

export const grainLotListQuerySchema = pageQuerySchema.extend({
  grainId: idSchema.optional(),
  q: z.string().trim().max(80).optional(),
});
export type GrainLotListQuery = z.infer<typeof grainLotListQuerySchema>;

export const prepBatchSchema = z.object({
  id: z.number().int(),
  code: z.string(),
  grainLotId: z.number().int(),
  supplierLotCode: z.string(),
  grainId: z.number().int(),
  grain: z.string(),
  preparedOn: z.string(),
  soakHours: z.number().nullable(),
  simmerMinutes: z.number().int().nullable(),
  drainMinutes: z.number().int().nullable(),
  notes: z.string().nullable(),
  createdAt: z.string(),
});
export type PrepBatchDto = z.infer<typeof prepBatchSchema>;

export const createPrepBatchSchema = z.object({
  code: registerCodeSchema,
  grainLotId: idSchema,
  preparedOn: recordedDateSchema,
  soakHours: z.number().min(0).max(96, 'must be at most 96 hours').nullish(),
  simmerMinutes: z.number().int('must be whole minutes').min(0).max(240).nullish(),
  drainMinutes: z.number().int('must be whole minutes').min(0).max(1440).nullish(),
  notes: optionalText(2000),
});
export type CreatePrepBatchInput = z.infer<typeof createPrepBatchSchema>;

export const prepBatchListQuerySchema = pageQuerySchema.extend({
  grainLotId: idSchema.optional(),
  /** A grain id or a grain name from the lab's list. */
  grain: z.string().trim().min(1).max(60).optional(),
  q: z.string().trim().max(40).optional(),
});
export type PrepBatchListQuery = z.infer<typeof prepBatchListQuerySchema>;

export const grainLotDetailSchema = grainLotSchema.extend({ prepBatches: z.array(prepBatchSchema) });
export type GrainLotDetailDto = z.infer<typeof grainLotDetailSchema>;

export const grainLotSortFields = ['receivedOn', 'supplierLotCode', 'createdAt'] as const;
export const prepBatchSortFields = ['code', 'preparedOn', 'createdAt'] as const;
