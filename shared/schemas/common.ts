import { z } from 'zod';

export const idSchema = z.coerce.number().int().positive();
export const idParamsSchema = z.object({ id: idSchema });

export const localDateSchema = z.iso.date({ error: 'must be a date written YYYY-MM-DD' });

export const pageQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
  sort: z
    .string()
    .regex(/^-?[A-Za-z][A-Za-z0-9]*$/, 'must be a field name, optionally prefixed with -')
    .optional(),
});
export type PageQuery = z.infer<typeof pageQuerySchema>;

export function pageOf<T extends z.ZodTypeAny>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int(),
    page: z.number().int(),
    pageSize: z.number().int(),
  });
}
export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export const fieldIssueSchema = z.object({ path: z.string(), message: z.string() });
export type FieldIssue = z.infer<typeof fieldIssueSchema>;

/** The one JSON error body every route answers with; the client's ApiError reads it. */
export const errorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    issues: z.array(fieldIssueSchema).optional(),
    requestId: z.string().optional(),
  }),
});
export type ErrorBody = z.infer<typeof errorBodySchema>;
