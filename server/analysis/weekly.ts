import type { WeeklyDto, WeeklyRow } from '../../shared/schemas/analysis-weekly';
import { pChartLimits } from '../../shared/stats/p-chart';
import { todayLocal } from '../core/local-time';
import { getLabSettings } from '../settings/settings.service';
import { analysisRepository, type Period } from './analysis.repository';
import { frameFor, sum } from './frame';
import { addDays, mondayOf } from '../core/calendar';

export const WEEKLY_DEFAULT_WEEKS = 12;

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
