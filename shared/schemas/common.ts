import { z } from 'zod';

export const idSchema = z.coerce.number().int().positive();
export const idParamsSchema = z.object({ id: idSchema });

export const localDateSchema = z.iso.date({ error: 'must be a date written YYYY-MM-DD' });

const dayMs = 86_400_000;
export const tooFarAhead = 'cannot be more than a day in the future';

/** Strict ISO 8601 with its offset (2026-03-01T09:30:00Z, …+01:00): no calendar roll-over, no numbers. */
export const instantSchema = z.iso.datetime({
  offset: true,
  error: 'must be a date and time with its offset, such as 2026-03-01T09:30:00Z',
});

/** A moment something happened: a day's slack covers clocks and zones, more is a typing slip. */
export const recordedInstantSchema = instantSchema.refine((v) => Date.parse(v) <= Date.now() + dayMs, tooFarAhead);

/** A local date is too far ahead when it has begun nowhere on Earth (UTC+14) within a day from now. */
export const isDateTooFarAhead = (date: string, now = Date.now()) => Date.parse(`${date}T00:00:00+14:00`) > now + dayMs;

/** The local date something happened on. */
export const recordedDateSchema = localDateSchema.refine((v) => !isDateTooFarAhead(v), tooFarAhead);

export const pageQuerySchema = z.object({
  page: z.coerce.number().int().min(1).max(1_000_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
  sort: z
    .string()
    .regex(/^-?[A-Za-z][A-Za-z0-9]*$/, 'must be a field name, optionally prefixed with -')
    .optional(),
});
export type PageQuery = z.infer<typeof pageQuerySchema>;

/** A list query: the page, size and sort of every list, and the list's own filters. */
export const listQueryOf = <S extends z.ZodRawShape>(filters: z.ZodObject<S>) => pageQuerySchema.extend(filters.shape);

/** Optional from/to dates of a filter, both inclusive. */
export const dateRangeShape = {
  from: localDateSchema.optional(),
  to: localDateSchema.optional(),
};

/** A refinement to spread into .refine(...rule). */
type Rule<T> = [check: (v: T) => boolean, issue: { path: string[]; message: string }];

/** For a query holding dateRangeShape. */
export const fromNotAfterTo: Rule<{ from?: string; to?: string }> = [
  (q: { from?: string; to?: string }) => !q.from || !q.to || q.from <= q.to,
  { path: ['to'], message: 'must not be before from' },
];

/** Who did the work: a user of the lab, or the typed name of staff without an account. */
export const operatorShape = {
  operatorId: idSchema.nullish(),
  operatorName: z.string().trim().min(1).max(120).nullish(),
};

/** For an input holding operatorShape. */
export const oneOperator: Rule<{ operatorId?: number | null; operatorName?: string | null }> = [
  (v: { operatorId?: number | null; operatorName?: string | null }) => !(v.operatorId && v.operatorName),
  { path: ['operatorName'], message: 'give either a user or a staff name, not both' },
];

export function pageOf<T extends z.ZodTypeAny>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int(),
    /** True when more rows match than were counted: `total` is then the cap, and the list goes on past it. */
    totalCapped: z.boolean().optional(),
    page: z.number().int(),
    pageSize: z.number().int(),
  });
}
export interface Page<T> {
  items: T[];
  total: number;
  totalCapped?: boolean;
  page: number;
  pageSize: number;
}

/** A register's next code, counted on from the lab's own latest one; the form may change it. */
export const suggestedCodeSchema = z.object({ code: z.string() });
export type SuggestedCodeDto = z.infer<typeof suggestedCodeSchema>;

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
