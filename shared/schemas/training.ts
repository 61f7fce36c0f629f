import { z } from 'zod';
import { roleSchema } from '../enums';
import { idSchema, pageQuerySchema, recordedDateSchema } from './common';

/** A person is a user or a staff person without an account: exactly one of the two ids. */
const onePerson: [(v: { userId?: number; staffId?: number }) => boolean, { path: string[]; message: string }] = [
  (v) => (v.userId === undefined) !== (v.staffId === undefined),
  { path: ['userId'], message: 'give either userId or staffId' },
];

/** The fields of a training record; the form picks from this, as a refined schema cannot be picked. */
export const trainingRecordFieldsSchema = z.object({
  userId: idSchema.optional(),
  staffId: idSchema.optional(),
  procedureVersionId: idSchema,
  trainedOn: recordedDateSchema,
  notes: z
    .string()
    .trim()
    .max(2000, 'use at most 2000 characters')
    .nullish()
    .transform((v) => (v ? v : null)),
});
export const createTrainingRecordSchema = trainingRecordFieldsSchema.refine(...onePerson);
export type CreateTrainingRecordInput = z.infer<typeof createTrainingRecordSchema>;

export const trainingRecordListQuerySchema = pageQuerySchema.extend({
  userId: idSchema.optional(),
  staffId: idSchema.optional(),
  procedureId: idSchema.optional(),
  procedureVersionId: idSchema.optional(),
});
export type TrainingRecordListQuery = z.infer<typeof trainingRecordListQuerySchema>;

export const trainingRecordSchema = z.object({
  id: z.number().int(),
  userId: z.number().int().nullable(),
  staffId: z.number().int().nullable(),
  personName: z.string(),
  procedureId: z.number().int(),
  procedureTitle: z.string(),
  procedureVersionId: z.number().int(),
  version: z.number().int(),
  trainerId: z.number().int().nullable(),
  trainerName: z.string(),
  trainedOn: z.string(),
  notes: z.string().nullable(),
  createdAt: z.string(),
});
export type TrainingRecordDto = z.infer<typeof trainingRecordSchema>;

export const operatorsQuerySchema = z.object({ procedureId: idSchema.optional() });
export type OperatorsQuery = z.infer<typeof operatorsQuerySchema>;

export const operatorRowSchema = z.object({
  userId: z.number().int().nullable(),
  /** A staff person without an account; their role is null. */
  staffId: z.number().int().nullable(),
  displayName: z.string(),
  role: roleSchema.nullable(),
  sessions: z.number().int(),
  jars: z.number().int(),
  contaminatedJars: z.number().int(),
  incidents: z.number().int(),
  trainedVersion: z.number().int().nullable(),
  lastTrainedOn: z.string().nullable(),
  trainedOnCurrent: z.boolean(),
  openRetrainRequests: z.number().int(),
});
export type OperatorRowDto = z.infer<typeof operatorRowSchema>;

export const operatorsSchema = z.object({
  procedure: z
    .object({
      id: z.number().int(),
      code: z.string(),
      title: z.string(),
      currentVersionId: z.number().int().nullable(),
      currentVersion: z.number().int().nullable(),
    })
    .nullable(),
  operators: z.array(operatorRowSchema),
});
export type OperatorsDto = z.infer<typeof operatorsSchema>;

export const createRetrainRequestSchema = z
  .object({
    userId: idSchema.optional(),
    staffId: idSchema.optional(),
    procedureVersionId: idSchema,
    reason: z.string().trim().min(1, 'say why retraining is needed').max(2000, 'use at most 2000 characters'),
  })
  .refine(...onePerson);
export type CreateRetrainRequestInput = z.infer<typeof createRetrainRequestSchema>;

export const retrainRequestListQuerySchema = pageQuerySchema.extend({
  userId: idSchema.optional(),
  staffId: idSchema.optional(),
  open: z.enum(['true', 'false']).optional(),
});
export type RetrainRequestListQuery = z.infer<typeof retrainRequestListQuerySchema>;

export const retrainRequestSchema = z.object({
  id: z.number().int(),
  userId: z.number().int().nullable(),
  staffId: z.number().int().nullable(),
  userName: z.string(),
  procedureId: z.number().int(),
  procedureTitle: z.string(),
  procedureVersionId: z.number().int(),
  version: z.number().int(),
  requestedById: z.number().int().nullable(),
  requestedByName: z.string().nullable(),
  reason: z.string().nullable(),
  doneAt: z.string().nullable(),
  createdAt: z.string(),
  /** Whether the person was sent an e-mail (they may have opted out or have no address). */
  mailed: z.boolean().optional(),
});
export type RetrainRequestDto = z.infer<typeof retrainRequestSchema>;
