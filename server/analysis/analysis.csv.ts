import type { BeforeAfterDto } from '../../shared/schemas/analysis-actions';
import type { CausesDto } from '../../shared/schemas/analysis-causes';
import type { FactorLevel } from '../../shared/schemas/analysis';
import type { ColonisationDto } from '../../shared/schemas/analysis-colonisation';
import type { CrosstabDto, RatesDto } from '../../shared/schemas/analysis-rates';
import type { LethalityDto } from '../../shared/schemas/analysis-lethality';
import type { WeeklyDto } from '../../shared/schemas/analysis-weekly';

export interface CsvTable {
  filename: string;
  header: string[];
  rows: unknown[][];
}

const span = (p: { from: string | null; to: string | null }) => `${p.from ?? 'start'}_${p.to ?? 'today'}`;

export const ratesCsv = (d: RatesDto): CsvTable => ({
  filename: `rates-${d.by}-${span(d)}.csv`,
  header: ['level', 'jars', 'contaminated', 'incubating', 'rate', 'ci95_low', 'ci95_high'],
  rows: [
    ...d.rows.map((r) => [r.level, r.jars, r.contaminated, r.incubating, r.rate, r.ci95[0], r.ci95[1]]),
    [
      '(all jars)',
      d.overall.jars,
      d.overall.contaminated,
      d.overall.incubating,
      d.overall.rate,
      d.overall.ci95[0],
      d.overall.ci95[1],
    ],
  ],
});

export const crosstabCsv = (d: CrosstabDto): CsvTable => ({
  filename: `crosstab-${d.rowFactor}-by-${d.colFactor}.csv`,
  header: [d.rowFactor, d.colFactor, 'jars', 'contaminated', 'incubating', 'rate', 'ci95_low', 'ci95_high'],
  rows: d.cells.map((c) => [c.row, c.col, c.jars, c.contaminated, c.incubating, c.rate, c.ci95[0], c.ci95[1]]),
});

const levelList = (ls: FactorLevel[]) => ls.map((x) => `${x.factor}=${x.level}`).join('; ');

export const causesCsv = (d: CausesDto): CsvTable => ({
  filename: `likely-causes-${span(d)}.csv`,
  header: [
    'factor',
    'level',
    'jars',
    'contaminated',
    'incubating',
    'rest_jars',
    'rest_contaminated',
    'rate',
    'rest_rate',
    'relative_risk',
    'rr95_low',
    'rr95_high',
    'p_value',
    'q_value',
    'confounded_with',
    'standing',
    'same_jars_as',
    'adjusted_given',
    'adjusted_relative_risk',
    'adjusted_rr95_low',
    'adjusted_rr95_high',
    'adjusted_p_value',
    'hint',
    'hint_basis',
  ],
  rows: d.causes.map((c) => [
    c.factor,
    c.level,
    c.jars,
    c.contaminated,
    c.incubating,
    c.restJars,
    c.restContaminated,
    c.rate,
    c.restRate,
    c.relativeRisk,
    c.rr95[0],
    c.rr95[1],
    c.pValue,
    c.qValue,
    levelList(c.confoundedWith),
    c.standing,
    levelList(c.sameJarsAs),
    levelList(c.adjusted?.given ?? []),
    c.adjusted?.relativeRisk ?? null,
    c.adjusted?.rr95[0] ?? null,
    c.adjusted?.rr95[1] ?? null,
    c.adjusted?.pValue ?? null,
    c.hint,
    c.hintBasis,
  ]),
});

export const weeklyCsv = (d: WeeklyDto): CsvTable => ({
  filename: `weekly-${d.from}_${d.to}.csv`,
  header: [
    'week',
    'grain',
    'jars',
    'contaminated',
    'incubating',
    'rate',
    'ucl',
    'lcl',
    'out_of_control',
    'below_lcl',
    'provisional',
  ],
  rows: d.weeks.flatMap((w) => [
    [
      w.week,
      '(all grains)',
      w.jars,
      w.contaminated,
      w.incubating,
      w.rate,
      w.ucl,
      w.lcl,
      w.outOfControl,
      w.belowLcl,
      w.provisional,
    ],
    ...w.grains.map((g) => [w.week, g.grain, g.jars, g.contaminated, g.incubating, g.rate, '', '', '', '', '']),
  ]),
});

export const colonisationCsv = (d: ColonisationDto): CsvTable => ({
  filename: `colonisation-${span(d)}.csv`,
  header: ['grain', 'day', 'at_risk', 'colonised', 'censored', 'still_colonising', 'median_days'],
  rows: d.curves.flatMap((c) =>
    c.steps.map((s) => [c.grain, s.day, s.atRisk, s.colonised, s.censored, s.stillColonising, c.medianDays]),
  ),
});

export const lethalityCsv = (d: LethalityDto): CsvTable => ({
  filename: `cook-lethality-${span(d)}.csv`,
  header: [
    'cook_run',
    'cooked_on',
    'container',
    'minutes_at_pressure',
    'gauge_kpa',
    'altitude_m',
    'f0',
    'f0_source',
    'gauge_assumed',
    'log_placement',
    'judged_by',
    'minimum_minutes',
    'below_target',
    'target',
    'jars',
    'contaminated',
    'rate',
  ],
  rows: d.runs.map((r) => [
    r.cookRun,
    r.cookedOn,
    r.container,
    r.minutesAtPressure,
    r.gaugeKPa,
    r.altitudeM,
    r.f0,
    r.f0Source,
    r.assumedGauge,
    r.logPlacement,
    r.judgedBy,
    r.minimumMinutes,
    r.belowTarget,
    d.target,
    r.jars,
    r.contaminated,
    r.rate,
  ]),
});

export const beforeAfterCsv = (d: BeforeAfterDto): CsvTable => ({
  filename: `before-after-action-${d.actionId}.csv`,
  header: ['period', 'from', 'to', 'jars', 'contaminated', 'incubating', 'rate', 'ci95_low', 'ci95_high'],
  rows: [
    [
      'before',
      d.before.from,
      d.before.to,
      d.before.jars,
      d.before.contaminated,
      d.before.incubating,
      d.before.rate,
      ...d.before.ci95,
    ],
    [
      'after',
      d.after.from,
      d.after.to,
      d.after.jars,
      d.after.contaminated,
      d.after.incubating,
      d.after.rate,
      ...d.after.ci95,
    ],
    ['difference (after - before)', '', '', '', '', '', d.difference, ...d.ci95],
  ],
});
