import type { Factor } from '../../shared/enums';
import type {
  BeforeAfterDto,
  BeforeAfterQuery,
  CausesDto,
  ColonisationDto,
  CrosstabDto,
  JarsBehindDto,
  JarsBehindQuery,
  LethalityDto,
  PeriodCount,
  RatesDto,
  Tally,
  WeeklyDto,
  WeeklyRow,
} from '../../shared/schemas/analysis';
import { kaplanMeier } from '../../shared/stats/kaplan-meier';
import { judgeCook } from '../../shared/stats/cook-verdict';
import { f0AtConstant } from '../../shared/stats/lethality';
import { pChartLimits } from '../../shared/stats/p-chart';
import { psiToKPa, sterilisingTemperatureC } from '../../shared/stats/steam';
import { wilsonInterval } from '../../shared/stats/wilson';
import { notFound, unprocessable } from '../core/errors';
import { localDate, todayLocal } from '../core/local-time';
import { getLabSettings } from '../settings/settings.service';
import { analysisRepository, type CountRow, type Frame, type Period } from './analysis.repository';
import { buildCauses } from './causes';
import { compareRates } from './comparison';
import { addDays, daysBetween, isoWeekMonday } from './dates';

export { compareRates } from './comparison';

/** The usual sterilising set-point (TRADE.md §1, common practice), assumed when a run has no gauge reading. */
export const USUAL_GAUGE_PSI = 15;
export const WEEKLY_DEFAULT_WEEKS = 12;
const BEFORE_AFTER_MAX_DAYS = 90;

export async function frameFor(p: Period, today = todayLocal()): Promise<Frame> {
  const s = await getLabSettings();
  return { from: p.from, to: p.to, windowStart: addDays(today, -s.observationWindowDays), edges: s.cookBucketEdges };
}

export function tally(c: CountRow): Tally {
  return {
    jars: c.jars,
    contaminated: c.contaminated,
    incubating: c.incubating,
    rate: c.jars > 0 ? c.contaminated / c.jars : null,
    ci95: wilsonInterval(c.contaminated, c.jars),
  };
}

const sum = (rows: CountRow[]): CountRow =>
  rows.reduce(
    (a, r) => ({
      jars: a.jars + r.jars,
      contaminated: a.contaminated + r.contaminated,
      incubating: a.incubating + r.incubating,
    }),
    {
      jars: 0,
      contaminated: 0,
      incubating: 0,
    },
  );

export async function rates(by: Factor, p: Period): Promise<RatesDto> {
  const rows = await analysisRepository.rates(by, await frameFor(p));
  const recorded = rows.filter((r): r is typeof r & { level: string } => r.level !== null);
  return {
    by,
    from: p.from ?? null,
    to: p.to ?? null,
    overall: tally(sum(rows)),
    notRecorded: sum(rows.filter((r) => r.level === null)).jars,
    rows: recorded.map((r) => ({ level: r.level, ...tally(r) })),
  };
}

function orderedLevels(entries: { level: string; order: string | number }[]): string[] {
  const first = new Map<string, string | number>();
  for (const e of entries) {
    const had = first.get(e.level);
    if (had === undefined || e.order < had) first.set(e.level, e.order);
  }
  return [...first.entries()]
    .sort(([la, a], [lb, b]) =>
      typeof a === 'number' && typeof b === 'number'
        ? a - b || (la < lb ? -1 : 1)
        : String(a).localeCompare(String(b), 'en', { sensitivity: 'base' }) || (la < lb ? -1 : 1),
    )
    .map(([level]) => level);
}

export async function crosstab(rowFactor: Factor, colFactor: Factor, p: Period): Promise<CrosstabDto> {
  const cells = await analysisRepository.crosstab(rowFactor, colFactor, await frameFor(p));
  const rows = orderedLevels(cells.map((c) => ({ level: c.row, order: c.rowOrder })));
  const cols = orderedLevels(cells.map((c) => ({ level: c.col, order: c.colOrder })));
  const rowIndex = new Map(rows.map((r, i) => [r, i]));
  const colIndex = new Map(cols.map((c, i) => [c, i]));
  return {
    rowFactor,
    colFactor,
    rows,
    cols,
    cells: cells
      .map((c) => ({ row: c.row, col: c.col, ...tally(c) }))
      .sort(
        (a, b) =>
          (rowIndex.get(a.row) ?? 0) - (rowIndex.get(b.row) ?? 0) ||
          (colIndex.get(a.col) ?? 0) - (colIndex.get(b.col) ?? 0),
      ),
  };
}

export async function causes(p: Period, minJars: number): Promise<CausesDto> {
  const combos = await analysisRepository.combinations(await frameFor(p));
  return { from: p.from ?? null, to: p.to ?? null, minJars, causes: buildCauses(combos, minJars) };
}

/** Default period: the last twelve ISO weeks, the current one included. */
export function defaultWeeklyPeriod(today = todayLocal()): { from: string; to: string } {
  return { from: addDays(isoWeekMonday(today), -7 * (WEEKLY_DEFAULT_WEEKS - 1)), to: today };
}

/** Exported for the mail digest: the same table the supervisor's home shows. */
export async function weeklyTable(p: Period = {}): Promise<WeeklyDto> {
  const today = todayLocal();
  const period = { from: p.from ?? defaultWeeklyPeriod(today).from, to: p.to ?? today };
  const [settings, raw] = await Promise.all([
    getLabSettings(),
    frameFor(period, today).then((f) => analysisRepository.weekly(f)),
  ]);
  const byWeek = new Map<string, typeof raw>();
  for (const r of raw) byWeek.set(r.week, [...(byWeek.get(r.week) ?? []), r]);
  const weeks = [...byWeek.entries()].map(([week, grains]) => ({ week, grains, total: sum(grains) }));
  const provisional = weeks.map((w) => w.total.incubating > 0);
  const chart = pChartLimits(
    weeks.map((w) => w.total.contaminated),
    weeks.map((w) => w.total.jars),
    provisional.map((pr) => !pr),
  );
  const rows: WeeklyRow[] = weeks.map((w, i) => {
    const limits = chart.limits[i] ?? { ucl: 1, lcl: 0 };
    const rate = w.total.contaminated / w.total.jars;
    const isProvisional = provisional[i] ?? false;
    return {
      week: w.week,
      jars: w.total.jars,
      contaminated: w.total.contaminated,
      incubating: w.total.incubating,
      rate,
      ucl: limits.ucl,
      lcl: limits.lcl,
      outOfControl: !isProvisional && !Number.isNaN(chart.pBar) && (rate > limits.ucl || rate < limits.lcl),
      aboveTarget: !isProvisional && rate > settings.contaminationTarget,
      provisional: isProvisional,
      grains: w.grains.map((g) => ({
        grain: g.grain,
        jars: g.jars,
        contaminated: g.contaminated,
        incubating: g.incubating,
        rate: g.contaminated / g.jars,
      })),
    };
  });
  return {
    from: period.from,
    to: period.to,
    pBar: Number.isNaN(chart.pBar) ? null : chart.pBar,
    target: settings.contaminationTarget,
    observationWindowDays: settings.observationWindowDays,
    weeks: rows,
  };
}

export async function colonisation(p: Period): Promise<ColonisationDto> {
  const raw = await analysisRepository.colonisation(p, todayLocal());
  const byGrain = new Map<string, typeof raw>();
  for (const r of raw) byGrain.set(r.grain, [...(byGrain.get(r.grain) ?? []), r]);
  const curves = [...byGrain.entries()].map(([grain, rows]) => {
    const times: number[] = [];
    const events: boolean[] = [];
    for (const r of rows) {
      for (let i = 0; i < r.jars; i++) {
        times.push(r.day);
        events.push(r.colonised);
      }
    }
    const km = kaplanMeier(times, events);
    const colonised = events.filter(Boolean).length;
    return {
      grain,
      jars: times.length,
      colonised,
      censored: times.length - colonised,
      medianDays: km.median,
      steps: km.steps.map((s) => ({
        day: s.time,
        atRisk: s.atRisk,
        colonised: s.events,
        censored: s.censored,
        stillColonising: s.survival,
      })),
    };
  });
  return { from: p.from ?? null, to: p.to ?? null, curves };
}

function estimateF0(minutes: number, gaugeKPa: number, altitudeM: number): number | null {
  try {
    return f0AtConstant(sterilisingTemperatureC(gaugeKPa, altitudeM), minutes);
  } catch {
    return null;
  }
}

export async function lethality(p: Period): Promise<LethalityDto> {
  const [settings, runs] = await Promise.all([getLabSettings(), analysisRepository.lethality(p)]);
  const rule = { lethalityTarget: settings.lethalityTarget, containerMinutes: settings.containerMinutes };
  return {
    from: p.from ?? null,
    to: p.to ?? null,
    target: rule.lethalityTarget,
    containerMinutes: rule.containerMinutes,
    runs: runs.map((r) => {
      const assumedGauge = r.f0 === null && r.gaugeKPa === null;
      const f0 = r.f0 ?? estimateF0(r.minutesAtPressure, r.gaugeKPa ?? psiToKPa(USUAL_GAUGE_PSI), r.altitudeM);
      const f0Source = r.f0 !== null ? r.f0Source : f0 === null ? null : 'estimate';
      return {
        cookRun: r.code,
        cookedOn: r.cookedOn,
        container: r.container,
        minutesAtPressure: r.minutesAtPressure,
        gaugeKPa: r.gaugeKPa,
        altitudeM: r.altitudeM,
        f0,
        f0Source,
        logPlacement: r.logPlacement,
        assumedGauge,
        ...judgeCook({ ...r, f0, f0Source }, rule),
        jars: r.jars,
        contaminated: r.contaminated,
        rate: r.jars > 0 ? r.contaminated / r.jars : null,
      };
    }),
  };
}

function periodCount(from: string, to: string, c: CountRow): PeriodCount {
  const t = tally(c);
  return { from, to, ...t };
}

/**
 * Equal periods either side of the day the action was done (or recorded): that day itself belongs to
 * neither, since jars inoculated on it may predate the fix.
 */
export async function beforeAfter(q: BeforeAfterQuery): Promise<BeforeAfterDto> {
  const action = await analysisRepository.action(q.actionId);
  if (!action) throw notFound('Corrective action');
  if (!action.factor || !action.level) {
    throw unprocessable('This corrective action names no factor level to compare.', [
      { path: 'actionId', message: 'the action has no factor and level' },
    ]);
  }
  const today = todayLocal();
  const pivot = action.doneOn ?? localDate(action.createdAt);
  const days = q.days ?? Math.min(BEFORE_AFTER_MAX_DAYS, Math.max(1, daysBetween(pivot, today)));
  const before = { from: addDays(pivot, -days), to: addDays(pivot, -1) };
  const after = { from: addDays(pivot, 1), to: addDays(pivot, days) };
  const [b, a] = await Promise.all([
    frameFor(before, today).then((f) => analysisRepository.levelCounts(action.factor!, action.level!, f)),
    frameFor(after, today).then((f) => analysisRepository.levelCounts(action.factor!, action.level!, f)),
  ]);
  return {
    actionId: action.id,
    factor: action.factor,
    level: action.level,
    pivot,
    days,
    before: periodCount(before.from, before.to, b),
    after: periodCount(after.from, after.to, a),
    ...compareRates(b, a),
  };
}

export async function jarsBehind(q: JarsBehindQuery): Promise<JarsBehindDto> {
  const f = await frameFor(q);
  const and = q.factor2 && q.level2 ? { factor: q.factor2, level: q.level2 } : undefined;
  const page = { offset: (q.page - 1) * q.pageSize, limit: q.pageSize };
  const { items, total } = await analysisRepository.jarsBehind(q.factor, q.level, q.only, f, page, and);
  return {
    factor: q.factor,
    level: q.level,
    factor2: and?.factor ?? null,
    level2: and?.level ?? null,
    items,
    total,
    page: q.page,
    pageSize: q.pageSize,
  };
}
