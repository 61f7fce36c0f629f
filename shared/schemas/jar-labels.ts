import { z } from 'zod';
import { optionalId } from './jar-fields';

export const labelSheetQuerySchema = z
  .object({
    ids: z
      .string()
      .transform((s) =>
        s
          .split(',')
          .map((x) => x.trim())
          .filter(Boolean)
          .map(Number),
      )
      .pipe(
        z
          .array(z.number('list jar ids separated by commas').int().positive())
          .min(1, 'list at least one jar id')
          .max(500, 'list at most 500 jars'),
      )
      .optional(),
    sessionId: optionalId,
  })
  .refine((v) => (v.ids === undefined) !== (v.sessionId === undefined), {
    path: ['ids'],
    message: 'give either ids or sessionId',
  });
export type LabelSheetQuery = z.infer<typeof labelSheetQuerySchema>;

export const labelSheetRowSchema = z.object({
  id: z.number().int(),
  label: z.string(),
  grain: z.string(),
  inoculatedOn: z.string(),
  sessionCode: z.string().nullable(),
  inoculumCode: z.string().nullable(),
  pageUrl: z.string(),
  qrPath: z.string(),
});
export type LabelSheetRowDto = z.infer<typeof labelSheetRowSchema>;

export const labelParamsSchema = z.object({ label: z.string().trim().min(1).max(40) });
