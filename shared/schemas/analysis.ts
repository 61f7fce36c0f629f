import { z } from 'zod';
import { factorSchema, type Factor, type LogPlacement } from '../enums';
import type { CookJudgedBy } from '../stats/cook-verdict';
import { idSchema, localDateSchema } from './common';

const formatSchema = z.enum(['json', 'csv']).default('json');

const periodBase = z.object({ from: localDateSchema.optional(), to: localDateSchema.optional(), format: formatSchema });

/** `to` before `from` is reported on `to`, the field a user would correct. */
const inOrder = (q: { from?: string | undefined; to?: string | undefined }) => !q.from || !q.to || q.from <= q.to;
const orderIssue = { path: ['to'], message: 'must not be before from' };

export const periodQuerySchema = periodBase.refine((q) => inOrder(q), orderIssue);
export type PeriodQuery = z.infer<typeof periodQuerySchema>;

/** A page of levels: without page, every level (the CSV); with page (pageSize default 25, at most 200), that page. */
const levelPage = {
  page: z.coerce.number().int().min(1).optional(),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
};

export const ratesQuerySchema = periodBase
  .extend({ by: factorSchema, ...levelPage })
  .refine((q) => inOrder(q), orderIssue);
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
  .refine((q) => q.rows !== q.cols, { path: ['cols'], message: 'must be a different factor from rows' });
export type CrosstabQuery = z.infer<typeof crosstabQuerySchema>;

export const causesQuerySchema = periodBase
  .extend({
    minJars: z.coerce.number().int().min(1).max(1_000_000).default(1),
    /** Without page, every row; with page (and pageSize, default 25, at most 200), that page. */
    page: z.coerce.number().int().min(1).optional(),
    pageSize: z.coerce.number().int().min(1).max(200).default(25),
    /** rank: the order of DESIGN.md §5; standing: leads and their same-jars levels, then elevated, explained, not elevated. */
    order: z.enum(['rank', 'standing']).default('rank'),
  })
  .refine((q) => inOrder(q), orderIssue);
export type CausesQuery = z.infer<typeof causesQuerySchema>;

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

export interface RateRow extends Tally {
  level: string;
}

export interface RatesDto {
  by: Factor;
  from: string | null;
  to: string | null;
  overall: Tally;
  /** Jars in the period without this attribute: left out of the rows. */
  notRecorded: number;
  rows: RateRow[];
}

/** Where a paged answer stands among all the levels. */
export interface LevelPage {
  /** Levels in all, over every page. */
  total: number;
  /** null when the answer holds every level. */
  page: number | null;
  pageSize: number | null;
}

export type RatesPageDto = RatesDto & LevelPage;

export interface CrosstabCell extends Tally {
  row: string;
  col: string;
}

export interface CrosstabDto {
  rowFactor: Factor;
  colFactor: Factor;
  rows: string[];
  cols: string[];
  cells: CrosstabCell[];
}

/** A window of the grid: `rows`, `cols` and `cells` hold only the levels of the page on each axis. */
export interface CrosstabPageDto extends CrosstabDto {
  rowPage: LevelPage;
  colPage: LevelPage;
}

export interface FactorLevel {
  factor: Factor;
  level: string;
}

/** DESIGN.md §4.3: where a row stands once the leads are chosen. */
export const standings = ['lead', 'same-jars', 'explained', 'elevated', 'not-elevated'] as const;
export type Standing = (typeof standings)[number];

/** Mantel–Haenszel relative risk of a level against its rest, stratified by the leads in `given`. */
export interface AdjustedRisk {
  given: FactorLevel[];
  relativeRisk: number;
  rr95: Interval;
  /** Two-sided Cochran–Mantel–Haenszel test with the continuity correction. */
  pValue: number;
}

/** Settled jars only (DESIGN.md §3); `incubating` counts the level's jars left out as still at risk. */
export interface CauseRow extends FactorLevel {
  jars: number;
  contaminated: number;
  incubating: number;
  restJars: number;
  restContaminated: number;
  rate: number;
  restRate: number;
  relativeRisk: number;
  rr95: Interval;
  pValue: number;
  qValue: number;
  confoundedWith: FactorLevel[];
  standing: Standing;
  /** The leads this level shares ≥ 90 % of its settled jars with, both ways. */
  sameJarsAs: FactorLevel[];
  adjusted: AdjustedRisk | null;
  hint: string | null;
  /** Where the hint comes from: the trade's common practice, or a named source beside it. */
  hintBasis: string | null;
  /** Contaminant code → jars, over this level's contaminated jars. */
  contaminants: Record<string, number>;
  medianDaysToDetection: number | null;
}

/** A lead in the order chosen, its row, and the levels that hold the same jars as it. */
export interface LeadDto extends FactorLevel {
  row: CauseRow;
  sameJars: FactorLevel[];
}

export interface CausesDto {
  from: string | null;
  to: string | null;
  minJars: number;
  leads: LeadDto[];
  causes: CauseRow[];
  total: number;
  page: number | null;
  pageSize: number | null;
}

export interface WeeklyGrain {
  grain: string;
  jars: number;
  contaminated: number;
  incubating: number;
  rate: number;
}

export interface WeeklyRow {
  week: string;
  jars: number;
  contaminated: number;
  incubating: number;
  rate: number;
  ucl: number;
  lcl: number;
  /** Above the upper limit: unusually many contaminated jars. */
  outOfControl: boolean;
  /** Below the lower limit: unusually few, a good signal and never an alarm. */
  belowLcl: boolean;
  /** Settled and above the lab's accepted rate, in control or not (DESIGN §4.4). */
  aboveTarget: boolean;
  provisional: boolean;
  grains: WeeklyGrain[];
}

export interface WeeklyDto {
  from: string;
  to: string;
  pBar: number | null;
  /** The contamination rate the lab accepts (a lab setting), a fraction. */
  target: number;
  observationWindowDays: number;
  weeks: WeeklyRow[];
}

export interface ColonisationCurve {
  grain: string;
  jars: number;
  colonised: number;
  censored: number;
  medianDays: number | null;
  steps: { day: number; atRisk: number; colonised: number; censored: number; stillColonising: number }[];
}

export interface ColonisationDto {
  from: string | null;
  to: string | null;
  curves: ColonisationCurve[];
}

export interface LethalityRow {
  cookRun: string;
  cookedOn: string | null;
  container: string | null;
  minutesAtPressure: number;
  gaugeKPa: number | null;
  altitudeM: number;
  f0: number | null;
  /** log: from the temperature log; estimate: minutes at the steam temperature (an upper bound). */
  f0Source: 'log' | 'estimate' | null;
  /** Where the logged probe sat; null without a log. */
  logPlacement: LogPlacement | null;
  /** The gauge was not recorded, so the estimate assumes the usual 15 psi set-point. */
  assumedGauge: boolean;
  /** centre-probe: F0 against the target; minutes: minutes at pressure against the container's minimum. */
  judgedBy: CookJudgedBy;
  /** The F0 is a chamber figure or an estimate: an upper bound that cannot pass the run. */
  f0UpperBound: boolean;
  minimumMinutes: number | null;
  belowTarget: boolean;
  jars: number;
  contaminated: number;
  rate: number | null;
}

export interface LethalityDto {
  from: string | null;
  to: string | null;
  target: number;
  containerMinutes: Record<string, number>;
  runs: LethalityRow[];
}

export interface PeriodCount {
  from: string;
  to: string;
  jars: number;
  contaminated: number;
  incubating: number;
  rate: number | null;
  ci95: Interval;
}

export interface RateComparison {
  /** after − before; negative means fewer contaminated jars after the action. */
  difference: number | null;
  ci95: [number | null, number | null];
  pValue: number | null;
}

export interface BeforeAfterDto extends RateComparison {
  actionId: number;
  factor: Factor;
  level: string;
  /** The done date: it belongs to neither period. */
  pivot: string;
  days: number;
  /** The after-period ended at least the observation window ago, so every jar in it is settled. */
  settled: boolean;
  /** Until then: days until it has; the comparison fields stay null. */
  daysRemaining: number | null;
  before: PeriodCount;
  after: PeriodCount;
}

export interface JarBehind {
  id: number;
  label: string;
  inoculatedOn: string;
  status: string;
  contaminated: boolean;
  incubating: boolean;
  contaminant: string | null;
  foundOn: string | null;
  /** The jar's first incident that counts, for a link. */
  incidentId: number | null;
}

export interface JarsBehindDto {
  factor: Factor;
  level: string;
  factor2: Factor | null;
  level2: string | null;
  items: JarBehind[];
  total: number;
  page: number;
  pageSize: number;
}

export interface ActionSummary {
  id: number;
  incidentId: number;
  what: string;
  ownerName: string;
  dueOn: string;
  doneOn: string | null;
  factor: Factor | null;
  level: string | null;
}

/** A corrective action with its before/after verdict, or why there is none yet. */
export interface ActionVerdictDto extends ActionSummary {
  comparison: BeforeAfterDto | null;
  unavailable: string | null;
}

export interface ActionVerdictsDto {
  items: ActionVerdictDto[];
  total: number;
  page: number;
  pageSize: number;
}
