import { z } from 'zod';
import { jarStatusSchema, jarStatuses, type JarStatus } from '../enums';
import { dateRangeShape, idSchema, pageQuerySchema } from './common';
import { instant, optionalId, optionalPlace } from './jar-fields';

/** Statuses a jar leaves the lab's hands in: no further events. */
export const endedStatuses: readonly JarStatus[] = ['discarded', 'released'];

export const createJarBatchSchema = z
  .object({
    sessionId: idSchema,
    count: z.coerce
      .number()
      .int('must be a whole number')
      .min(1, 'make at least 1 jar')
      .max(200, 'make at most 200 jars at once'),
    grainId: optionalId,
    prepBatchId: optionalId,
    cookRunId: optionalId,
    cultureId: optionalId,
    parentJarId: optionalId,
    inoculumMl: z.preprocess(
      (v) => (v === '' || v === null ? undefined : v),
      z.coerce.number().positive('must be more than 0').max(1000, 'must be at most 1000 ml').optional(),
    ),
    room: optionalPlace,
    shelf: optionalPlace,
    inoculatedAt: instant.optional(),
  })
  .superRefine((v, ctx) => {
    if (v.cultureId === undefined && v.parentJarId === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['cultureId'],
        message: 'choose the culture or the parent jar the jars were inoculated from',
      });
    }
    if (v.cultureId !== undefined && v.parentJarId !== undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['parentJarId'],
        message: 'a jar is inoculated from a culture or a parent jar, not both',
      });
    }
    if (v.grainId === undefined && v.prepBatchId === undefined) {
      ctx.addIssue({ code: 'custom', path: ['grainId'], message: 'choose the grain or the prep batch' });
    }
    if ((v.room === undefined) !== (v.shelf === undefined)) {
      ctx.addIssue({
        code: 'custom',
        path: [v.room === undefined ? 'room' : 'shelf'],
        message: 'give both room and shelf, or neither',
      });
    }
  });
export type CreateJarBatchInput = z.infer<typeof createJarBatchSchema>;
/** What a form holds before parsing: times still as text. */
export type CreateJarBatchFields = z.input<typeof createJarBatchSchema>;

const statusList = z
  .string()
  .transform((s) =>
    s
      .split(',')
      .map((x) => x.trim())
      .filter(Boolean),
  )
  .pipe(z.array(jarStatusSchema).min(1, `use one or more of ${jarStatuses.join(', ')}`));

export const jarSortFields = ['label', 'inoculatedOn', 'status', 'grain', 'room'] as const;

export const jarListQuerySchema = pageQuerySchema.extend({
  status: statusList.optional(),
  grainId: optionalId,
  cookRunId: optionalId,
  sessionId: optionalId,
  cultureId: optionalId,
  room: optionalPlace,
  shelf: optionalPlace,
  q: z.string().trim().max(40).optional(),
  ...dateRangeShape,
});
export type JarListQuery = z.infer<typeof jarListQuerySchema>;
export type JarFilters = Omit<JarListQuery, 'page' | 'pageSize' | 'sort'>;
export const jarExportQuerySchema = jarListQuerySchema.omit({ page: true, pageSize: true });
export type JarExportQuery = z.infer<typeof jarExportQuerySchema>;

export const jarRowSchema = z.object({
  id: z.number().int(),
  label: z.string(),
  status: jarStatusSchema,
  grainId: z.number().int(),
  grain: z.string(),
  prepBatchId: z.number().int().nullable(),
  prepBatchCode: z.string().nullable(),
  cookRunId: z.number().int().nullable(),
  cookRunCode: z.string().nullable(),
  sessionId: z.number().int().nullable(),
  sessionCode: z.string().nullable(),
  cultureId: z.number().int().nullable(),
  cultureCode: z.string().nullable(),
  parentJarId: z.number().int().nullable(),
  parentJarLabel: z.string().nullable(),
  inoculumMl: z.number().nullable(),
  room: z.string().nullable(),
  shelf: z.string().nullable(),
  shelfPosition: z.number().int().nullable(),
  inoculatedAt: z.string(),
  inoculatedOn: z.string(),
  colonisedOn: z.string().nullable(),
  endedOn: z.string().nullable(),
  imported: z.boolean(),
});
export type JarRowDto = z.infer<typeof jarRowSchema>;

export const jarBatchResultSchema = z.object({ jars: z.array(jarRowSchema), warnings: z.array(z.string()) });
export type JarBatchResultDto = z.infer<typeof jarBatchResultSchema>;
