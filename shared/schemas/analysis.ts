import { z } from 'zod';
import { factorSchema, type Factor } from '../enums';
import { idSchema, localDateSchema } from './common';

const formatSchema = z.enum(['json', 'csv']).default('json');

const periodBase = z.object({ from: localDateSchema.optional(), to: localDateSchema.optional(), format: formatSchema });

/** `to` before `from` is reported on `to`, the field a user would correct. */
const inOrder = (q: { from?: string | undefined; to?: string | undefined }) => !q.from || !q.to || q.from <= q.to;
const orderIssue = { path: ['to'], message: 'must not be before from' };

export const periodQuerySchema = periodBase.refine((q) => inOrder(q), orderIssue);
export type PeriodQuery = z.infer<typeof periodQuerySchema>;

/** A page of levels (pageSize default 25, at most 200). */
const levelPage = {
  page: z.coerce.number().int().min(1).optional(),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
};

/**
 * A JSON answer is always a page, the first unless another is asked for, so that no answer grows with the lab;
 * the CSV download (format=csv) is the one answer that holds every level.
 */
function pagedUnlessCsv<Q extends { format: 'json' | 'csv'; page?: number | undefined }>(q: Q): Q {
  return q.format === 'csv' ? { ...q, page: undefined } : { ...q, page: q.page ?? 1 };
}

export const ratesQuerySchema = periodBase
  .extend({ by: factorSchema, ...levelPage })
  .refine((q) => inOrder(q), orderIssue)
  .transform(pagedUnlessCsv);
export type RatesQuery = z.infer<typeof ratesQuerySchema>;

export const crosstabQuerySchema = periodBase
  .extend({
    rows: factorSchema,
    cols: factorSchema,
    ...levelPage,
    /** Columns page alike, so that a factor with hundreds of levels (weeks, sessions) fits a screen either way. */
    colPage: z.coerce.number().int().min(1).optional(),
    colPageSize: z.coerce.number().int().min(1).max(100).default(20),
  })
  .refine((q) => inOrder(q), orderIssue)
  .refine((q) => q.rows !== q.cols, { path: ['cols'], message: 'must be a different factor from rows' })
  .transform((q) => {
    const paged = pagedUnlessCsv(q);
    return { ...paged, colPage: paged.page === undefined ? undefined : (q.colPage ?? 1) };
  });
export type CrosstabQuery = z.infer<typeof crosstabQuerySchema>;

export const causesQuerySchema = periodBase
  .extend({
    minJars: z.coerce.number().int().min(1).max(1_000_000).default(1),
    /** A page of rows (pageSize default 25, at most 200); see pagedUnlessCsv. */
    page: z.coerce.number().int().min(1).optional(),
    pageSize: z.coerce.number().int().min(1).max(200).default(25),
    /** rank: the order of DESIGN.md §5; standing: leads and their same-jars levels, then elevated, explained, not elevated. */
    order: z.enum(['rank', 'standing']).default('rank'),
  })
  .refine((q) => inOrder(q), orderIssue)
  .transform(pagedUnlessCsv);
export type CausesQuery = z.infer<typeof causesQuerySchema>;

export const lethalityQuerySchema = periodBase
  .extend({
    /** below: only the runs that fall below their target. */
    only: z.enum(['all', 'below']).default('all'),
    ...levelPage,
  })
  .refine((q) => inOrder(q), orderIssue)
  .transform(pagedUnlessCsv);
export type LethalityQuery = z.infer<typeof lethalityQuerySchema>;

export const beforeAfterQuerySchema = z.object({
  actionId: idSchema,
  /** Length of each period; by default the days elapsed since the action, at most 90. */
  days: z.coerce.number().int().min(1).max(365).optional(),
  /** A preview while closing an open action: the periods as if it were done on this day. */
  doneOn: localDateSchema.optional(),
  format: formatSchema,
});
export type BeforeAfterQuery = z.infer<typeof beforeAfterQuerySchema>;

export const actionVerdictsQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
});
export type ActionVerdictsQuery = z.infer<typeof actionVerdictsQuerySchema>;

export const jarsBehindQuerySchema = periodBase
  .extend({
    factor: factorSchema,
    level: z.string().min(1, 'name the level').max(120),
    only: z.enum(['all', 'settled', 'contaminated', 'incubating']).default('all'),
    /** A second factor and level, for a cell of a cross-table or a grain of a week. */
    factor2: factorSchema.optional(),
    level2: z.string().min(1, 'name the level').max(120).optional(),
    page: z.coerce.number().int().min(1).max(1_000_000).default(1),
    pageSize: z.coerce.number().int().min(1).max(200).default(50),
  })
  .refine((q) => inOrder(q), orderIssue)
  .refine((q) => (q.factor2 === undefined) === (q.level2 === undefined), {
    path: ['level2'],
    message: 'give both factor2 and level2, or neither',
  });
export type JarsBehindQuery = z.infer<typeof jarsBehindQuerySchema>;

export type Interval = [number, number];

export interface Tally {
  jars: number;
  contaminated: number;
  incubating: number;
  rate: number | null;
  ci95: Interval;
}

/** Where a paged answer stands among all the levels. */
export interface LevelPage {
  /** Levels in all, over every page. */
  total: number;
  /** null when the answer holds every level. */
  page: number | null;
  pageSize: number | null;
}

export interface FactorLevel {
  factor: Factor;
  level: string;
}
