import type { Factor } from '../../shared/enums';
import type { CausesDto } from '../../shared/schemas/analysis-causes';
import type { ColonisationDto } from '../../shared/schemas/analysis-colonisation';
import type { CrosstabDto, RatesDto } from '../../shared/schemas/analysis-rates';
import type { JarsBehindDto } from '../../shared/schemas/analysis-jars-behind';
import type { JarsBehindQuery } from '../../shared/schemas/analysis';
import type { LethalityDto } from '../../shared/schemas/analysis-lethality';
import type { WeeklyDto, WeeklyRow } from '../../shared/schemas/analysis-weekly';
import { kaplanMeier } from '../../shared/stats/kaplan-meier';
import { judgeCook } from '../../shared/stats/cook-verdict';
import { f0AtConstant } from '../../shared/stats/lethality';
import { pChartLimits } from '../../shared/stats/p-chart';
import { psiToKPa, sterilisingTemperatureC } from '../../shared/stats/steam';
import { todayLocal } from '../core/local-time';
import { getLabSettings } from '../settings/settings.service';
import { analysisRepository, type Period } from './analysis.repository';
import type { CountRow } from './analysis.queries';
import { buildCauses, byStanding } from './causes';
import { addDays, mondayOf } from '../core/calendar';

export { compareRates } from './comparison';
export { frameFor, tally } from './frame';
import { frameFor, tally } from './frame';
export { beforeAfter, actionVerdicts } from './before-after';

/** The usual sterilising set-point (TRADE.md §1, common practice), assumed when a run has no gauge reading. */
export const USUAL_GAUGE_PSI = 15;
export const WEEKLY_DEFAULT_WEEKS = 12;

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

export async function causes(
  p: Period,
  minJars: number,
  paging: { page?: number | undefined; pageSize: number; order?: 'rank' | 'standing' } = { pageSize: 25 },
): Promise<CausesDto> {
  const combos = await analysisRepository.combinations(await frameFor(p));
  const { leads, rows, describe } = buildCauses(combos, minJars);
  if (paging.order === 'standing') rows.sort(byStanding);
  const page = paging.page ?? null;
  const shown = page === null ? rows : rows.slice((page - 1) * paging.pageSize, page * paging.pageSize);
  describe([...shown, ...leads.map((l) => l.row)]);
  return {
    from: p.from ?? null,
    to: p.to ?? null,
    minJars,
    leads,
    causes: shown,
    total: rows.length,
    page,
    pageSize: page === null ? null : paging.pageSize,
  };
}

/** Default period: the last twelve ISO weeks, the current one included. */
export function defaultWeeklyPeriod(today = todayLocal()): { from: string; to: string } {
  return { from: addDays(mondayOf(today), -7 * (WEEKLY_DEFAULT_WEEKS - 1)), to: today };
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
    const charted = !isProvisional && !Number.isNaN(chart.pBar);
    return {
      week: w.week,
      jars: w.total.jars,
      contaminated: w.total.contaminated,
      incubating: w.total.incubating,
      rate,
      ucl: limits.ucl,
      lcl: limits.lcl,
      // DESIGN.md §4.4: only above the upper limit is out of control; below the lower one is a good signal.
      outOfControl: charted && rate > limits.ucl,
      belowLcl: charted && rate < limits.lcl,
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
